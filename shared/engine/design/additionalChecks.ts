import { checkShear } from '../members/shear';
import type { TrussProfile } from '../profiles/types';
import type { MemberDemands } from './demands';
import type { DesignCombination } from './types';

/** Shear of one chord member with its chosen lumber, worst over the combinations (N, MPa). */
export interface ShearCheck {
  member: string;
  /** Largest |V| along the member under the governing combination, N (from the frame). */
  shear: number;
  fv: number;
  fvPrime: number;
  ratio: number;
  combination: string;
  pass: boolean;
}

/**
 * Chord shear fv = 1.5V/A ≤ Fv′ (NDS 2018 §3.4.2) per chord member, V the largest member shear
 * of the design frame under each combination and Fv′ with that combination's CD; the worst
 * combination is reported. (Sizing already counts the same ratio in each member's CSI.)
 */
export function chordShearChecks(
  profile: TrussProfile,
  demands: MemberDemands,
  combos: readonly DesignCombination[],
  lumberOf: readonly string[],
  plies: number,
): ShearCheck[] {
  const m = profile.members.length;
  const out: ShearCheck[] = [];
  profile.members.forEach((mb, k) => {
    if (mb.role === 'web') return;
    let worst: ShearCheck | undefined;
    combos.forEach((c, i) => {
      const shear = demands.shear[i * m + k];
      const r = checkShear({ lumberId: lumberOf[k], plies, shear, cd: c.cd });
      if (!worst || r.ratio > worst.ratio) {
        worst = { member: mb.id, shear, ...r, combination: c.name, pass: r.ratio <= 1 };
      }
    });
    if (worst) out.push(worst);
  });
  return out;
}

/** Checks of a sized truss beyond member CSIs, bearings, deflection and plates. */
export interface AdditionalChecks {
  /** Chord shear per chord member (NDS 2018 §3.4.2). */
  shear: ShearCheck[];
}
