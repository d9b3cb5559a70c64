import { checkShear } from '../members/shear';
import type { TrussProfile } from '../profiles/types';
import { N_PER_LBF } from '../units';
import type { MemberDemands } from './demands';
import type { ServiceDeflection } from './serviceDeflection';
import type { DeflectionSizing } from './serviceSizing';
import type { DeflectionCheck, DesignCombination, DesignDeflection, DesignReaction } from './types';

/** Creep factor Kcr for seasoned lumber in dry service, NDS 2018 §3.5.2. */
export const KCR_SEASONED_DRY = 1.5;

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

/** A bearing the truss lifts off under some combination: the force a hold-down must carry. */
export interface UpliftCheck {
  joint: string;
  /** Largest net uplift, N (> 0), and its combination. */
  force: number;
  combination: string;
}

/** Net uplift at each bearing that has any (frame reactions): the hold-down force. */
export function upliftChecks(
  reactions: readonly DesignReaction[],
  combos: readonly DesignCombination[],
): UpliftCheck[] {
  return reactions
    .filter((r) => r.maxUp > 0)
    .map((r) => {
      const i = r.vertical.indexOf(-r.maxUp);
      return { joint: r.joint, force: r.maxUp, combination: combos[Math.max(0, i)].name };
    });
}

/** The warning of a net uplift, in pounds and newtons. */
export const upliftWarning = (u: UpliftCheck) =>
  `Net uplift at ${u.joint}: ${Math.round(u.force / N_PER_LBF)} lb (${Math.round(u.force)} N) ` +
  `under ${u.combination}; a hold-down (uplift connector) rated for at least this force must ` +
  'tie the truss to its bearing.';

/**
 * Long-term deflection, NDS 2018 §3.5.2: ΔT = Kcr·ΔLT + ΔST, the dead load long-term
 * (Kcr = 1.5, seasoned lumber in dry service) and the live load short-term, at each bottom-chord
 * panel point from the frame's drops, against the total-load limit.
 */
export function longTermDeflection(
  deflection: DesignDeflection,
  span: number,
  limit: number,
): DeflectionCheck {
  const drops = deflection.bottomChord.map((b) => KCR_SEASONED_DRY * (b.total - b.live) + b.live);
  let at = 0;
  for (let i = 1; i < drops.length; i++) if (drops[i] > drops[at]) at = i;
  const max = Math.max(0, drops[at] ?? 0);
  const ratio = max > 0 ? span / max : Infinity;
  const live = deflection.liveCase;
  return {
    load: live ? `${KCR_SEASONED_DRY}D + ${live}` : `${KCR_SEASONED_DRY}D`,
    max,
    joint: deflection.bottomChord[at]?.joint ?? '',
    ratio,
    limit,
    pass: ratio >= limit,
  };
}

/** Checks of a sized truss beyond member CSIs, bearings, deflection and plates. */
export interface AdditionalChecks {
  /** Chord shear per chord member (NDS 2018 §3.4.2). */
  shear: ShearCheck[];
  /** Bearings with net uplift and the hold-down force. */
  uplift: UpliftCheck[];
  /** NDS 2018 §3.5.2: Kcr·Δ(dead) + Δ(live) at the bottom-chord panel points, total-load limit. */
  longTermDeflection: DeflectionCheck;
  /** Mid-panel and overhang-tip deflection, and a scissor's roller movement. */
  deflection: ServiceDeflection;
  /** Chords raised above what strength needs so that a deflection check passes. */
  deflectionSizing?: DeflectionSizing[];
}
