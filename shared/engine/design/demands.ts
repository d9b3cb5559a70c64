import { prepareTruss, solveLoads } from '../analysis';
import type { TrussModel } from '../analysis/types';
import type { TrussProfile } from '../profiles/types';
import type { CombinedLoads } from './combinedLoads';

/**
 * What every member carries under every combination. Row-major [combination][member]:
 * axial force N (tension +) and in-plane bending moment N·mm (≥ 0).
 */
export interface MemberDemands {
  combinations: number;
  members: number;
  axial: Float64Array;
  moment: Float64Array;
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
 * forces do not depend on EA and can be found before any lumber is chosen. Chord bending between
 * panel points is wL²/8 of each member as a simple span (conservative for a continuous chord);
 * on a heel panel carrying an overhang, the cantilever moment at the heel governs when larger.
 */
export function memberDemands(profile: TrussProfile, combos: CombinedLoads[]): MemberDemands {
  const prepared = prepareTruss(profileModel(profile));
  const m = profile.members.length;
  const n = combos.length;
  const s = profile.supports.length;
  const axial = new Float64Array(n * m);
  const moment = new Float64Array(n * m);
  const rx = new Float64Array(n * s);
  const ry = new Float64Array(n * s);
  combos.forEach((c, i) => {
    const result = solveLoads(prepared, c.jointLoads);
    for (let k = 0; k < m; k++) {
      axial[i * m + k] = result.members[k].force;
      const l = profile.members[k].length;
      const span = Math.abs(c.transverse[k]) * l * l * 0.125;
      moment[i * m + k] = Math.max(span, Math.abs(c.overhangMoment[k]));
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
    rx,
    ry,
    supports: profile.supports.map((sp) => sp.joint),
  };
}
