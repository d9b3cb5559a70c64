import type { TrussModel } from '../analysis/types';
import { solveFrame, type PreparedFrame } from '../frame';
import type { TrussProfile } from '../profiles/types';
import type { CombinedLoads } from './combinedLoads';
import { frameLoadsOf } from './frameModel';

/**
 * What every member carries under every combination, from one frame solution per combination.
 * Row-major [combination][member]: axial force N (tension +), in-plane bending moments N·mm and
 * shear N (magnitudes ≥ 0; 0 on the pinned webs).
 */
export interface MemberDemands {
  combinations: number;
  members: number;
  axial: Float64Array;
  /** Design moment: the larger of `spanMoment` and `supportMoment` (what the member check uses). */
  moment: Float64Array;
  /** Largest |M| between the member's ends (at zero shear or under a point load). */
  spanMoment: Float64Array;
  /** Largest |M| at the member's two ends (panel points; 0 at a hinge). */
  supportMoment: Float64Array;
  /**
   * Largest |V| along the member; on a top-chord member that carries an overhang, at least the
   * overhang's root shear at the heel (see `overhangRootLevers`).
   */
  shear: Float64Array;
  /** |V| at the member's start (`from` joint) and end (`to` joint), N: what a plate there carries across the grain. */
  startShear: Float64Array;
  endShear: Float64Array;
  /** Reactions per support per combination: [combination][support] rx and ry, N. */
  rx: Float64Array;
  ry: Float64Array;
  supports: string[];
}

/** The pin-jointed model of a profile (method of joints, `analyze`): joints, members, supports. */
export const profileModel = (profile: TrussProfile): TrussModel => ({
  joints: profile.joints,
  members: profile.members.map((m) => ({ id: m.id, from: m.from, to: m.to })),
  supports: profile.supports,
});

/**
 * Per member index, the slope length s of the overhang it carries (0 for none). The overhang is
 * the same piece of lumber but not a frame member: a cantilever under a uniform load square to
 * it, w⊥, whose heel moment M = w⊥s²/2 enters the frame, so its root shear is w⊥s = 2M/s. The
 * frame's own shear just inside the heel is usually larger, but not when the overhang carries
 * more than the first panel (a soffit's wind pressure), so the member's shear takes the larger.
 */
export function overhangRootLevers(profile: TrussProfile): Float64Array {
  const out = new Float64Array(profile.members.length);
  for (const o of profile.overhangs) {
    const k = profile.members.findIndex((m) => m.id === o.member);
    if (k >= 0 && o.horizontal > 0 && o.slopeLength > 0) out[k] = o.slopeLength;
  }
  return out;
}

/**
 * Solves every combination on one factorised design frame (`designFrame`): chords continuous
 * within each piece, webs pinned, line loads on the chord members, overhangs as heel forces and
 * moments. Axial forces, moments, shears and reactions all come from that one solution.
 */
export function memberDemands(
  profile: TrussProfile,
  combos: readonly CombinedLoads[],
  frame: PreparedFrame,
): MemberDemands {
  const m = profile.members.length;
  const n = combos.length;
  const s = profile.supports.length;
  const axial = new Float64Array(n * m);
  const moment = new Float64Array(n * m);
  const spanMoment = new Float64Array(n * m);
  const supportMoment = new Float64Array(n * m);
  const shear = new Float64Array(n * m);
  const startShear = new Float64Array(n * m);
  const endShear = new Float64Array(n * m);
  const rx = new Float64Array(n * s);
  const ry = new Float64Array(n * s);
  const lever = overhangRootLevers(profile);
  combos.forEach((c, i) => {
    const result = solveFrame(
      frame,
      frameLoadsOf(profile, c.jointLoads, c.transverse, c.overhangMoment, c.points),
    );
    for (let k = 0; k < m; k++) {
      const at = i * m + k;
      const r = result.members[k];
      axial[at] = r.axial;
      spanMoment[at] = r.spanMoment;
      supportMoment[at] = Math.max(Math.abs(r.startMoment), Math.abs(r.endMoment));
      moment[at] = r.maxMoment;
      // NDS 2018 §3.4.2 at the overhang's root (the bearing): V = 2|M|/s.
      const root = lever[k] > 0 ? (2 * Math.abs(c.overhangMoment[k])) / lever[k] : 0;
      shear[at] = Math.max(r.maxShear, root);
      startShear[at] = r.startShear;
      endShear[at] = r.endShear;
    }
    result.reactions.forEach((r, j) => {
      rx[i * s + j] = r.rx;
      ry[i * s + j] = r.ry;
    });
  });
  return {
    combinations: n,
    members: m,
    axial,
    moment,
    spanMoment,
    supportMoment,
    shear,
    startShear,
    endShear,
    rx,
    ry,
    supports: profile.supports.map((sp) => sp.joint),
  };
}
