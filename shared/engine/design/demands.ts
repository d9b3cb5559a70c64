import { prepareTruss, solveLoads } from '../analysis';
import type { TrussModel } from '../analysis/types';
import type { TrussProfile } from '../profiles/types';
import { chordBeams, chordMoments } from './chordBending';
import type { CombinedLoads } from './combinedLoads';

/**
 * What every member carries under every combination. Row-major [combination][member]:
 * axial force N (tension +) and in-plane bending moments N·mm (≥ 0; 0 on webs).
 */
export interface MemberDemands {
  combinations: number;
  members: number;
  axial: Float64Array;
  /** Design moment: the larger of `spanMoment` and `supportMoment` (what the member check uses). */
  moment: Float64Array;
  /** Largest |M| between the member's panel points, from the continuous chord. */
  spanMoment: Float64Array;
  /** Largest |M| at the member's two panel points (support moments of the continuous chord). */
  supportMoment: Float64Array;
  /** Reactions per support per combination: [combination][support] rx and ry, N. */
  rx: Float64Array;
  ry: Float64Array;
  supports: string[];
}

/** The analysis model of a profile: joints, members and supports, no stiffness. */
export const profileModel = (profile: TrussProfile): TrussModel => ({
  joints: profile.joints,
  members: profile.members.map((m) => ({ id: m.id, from: m.from, to: m.to })),
  supports: profile.supports,
});

/**
 * Solves every combination once on one prepared truss. The profile is determinate, so member
 * forces do not depend on EA and can be found before any lumber is chosen. Chord bending comes
 * from each chord piece as a continuous beam over its panel points (`chordMoments`), with the
 * overhang as a cantilever beyond the heel and a hinge at the peak and at splices; it is solved
 * for each combination's factored line loads, the same linear combination as the joint loads.
 */
export function memberDemands(profile: TrussProfile, combos: CombinedLoads[]): MemberDemands {
  const prepared = prepareTruss(profileModel(profile));
  const m = profile.members.length;
  const n = combos.length;
  const s = profile.supports.length;
  const axial = new Float64Array(n * m);
  const moment = new Float64Array(n * m);
  const spanMoment = new Float64Array(n * m);
  const supportMoment = new Float64Array(n * m);
  const beams = chordBeams(profile);
  const bending = { span: spanMoment, support: supportMoment };
  const rx = new Float64Array(n * s);
  const ry = new Float64Array(n * s);
  combos.forEach((c, i) => {
    const result = solveLoads(prepared, c.jointLoads);
    chordMoments(beams, c.transverse, c.overhangMoment, bending, i * m);
    for (let k = 0; k < m; k++) {
      const at = i * m + k;
      axial[at] = result.members[k].force;
      moment[at] = Math.max(spanMoment[at], supportMoment[at]);
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
    rx,
    ry,
    supports: profile.supports.map((sp) => sp.joint),
  };
}
