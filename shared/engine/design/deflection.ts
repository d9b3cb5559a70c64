import { prepareTruss, solveLoads, type PreparedTruss } from '../analysis';
import type { JointLoad } from '../analysis/types';
import type { CaseLoads } from '../loads';
import { designValues, parseLumberId, sectionProperties } from '../lumber';
import type { TrussProfile } from '../profiles/types';
import type { DesignCaseId } from './combinedLoads';
import { profileModel } from './demands';
import type { DeflectionCheck, DesignDeflection } from './types';

/** Axial stiffness E·A of a lumber id with `plies` side by side, N (E in MPa × A in mm²). */
export function axialStiffness(lumberId: string, plies: number): number {
  const { size } = parseLumberId(lumberId);
  // E takes no CD (NDS 2018 Table 4.3.1), so any CD gives the same modulus.
  return (
    designValues(lumberId, { cd: 1, repetitive: false }).e * sectionProperties(size, plies).area
  );
}

/** The profile's model with each member's EA from its lumber, prepared for the stiffness method. */
export function prepareWithStiffness(
  profile: TrussProfile,
  lumberOf: readonly string[],
  plies: number,
): PreparedTruss {
  const base = profileModel(profile);
  const ea = new Map<string, number>();
  const members = base.members.map((m, k) => {
    const key = lumberOf[k];
    let value = ea.get(key);
    if (value === undefined) ea.set(key, (value = axialStiffness(key, plies)));
    return { ...m, ea: value };
  });
  return prepareTruss({ ...base, members });
}

const LIVE_CASES: DesignCaseId[] = ['Lr', 'S', 'L', 'Lbc'];
const LABEL: Partial<Record<DesignCaseId, string>> = { Lr: 'Lr', S: 'S', L: 'L', Lbc: 'L(bc)' };

/** Sum of unfactored case loads. */
const sumLoads = (...sets: (JointLoad[] | undefined)[]): JointLoad[] =>
  sets.flatMap((s) => s ?? []);

/** Downward vertical displacement of each bottom-chord joint, mm (down +). */
function bottomChordDrop(
  prepared: PreparedTruss,
  profile: TrussProfile,
  loads: JointLoad[],
): number[] {
  const result = solveLoads(prepared, loads);
  const index = prepared.geometry.jointIndex;
  return profile.bottomChordJoints.map((j) => -result.displacements![index.get(j)!].uy);
}

function check(
  load: string,
  drops: number[],
  profile: TrussProfile,
  limit: number,
): DeflectionCheck {
  let at = 0;
  for (let i = 1; i < drops.length; i++) if (drops[i] > drops[at]) at = i;
  const max = Math.max(0, drops[at]);
  const ratio = max > 0 ? profile.params.span / max : Infinity;
  return { load, max, joint: profile.bottomChordJoints[at], ratio, limit, pass: ratio >= limit };
}

/**
 * Live and total-load deflection by the direct stiffness method with the chosen lumber (axial
 * strain only: no joint slip or creep). Live is the unfactored live case (Lr, S, L or L(bc))
 * that deflects most; total is dead plus that live case. Limits are span/n.
 */
export function designDeflection(
  prepared: PreparedTruss,
  profile: TrussProfile,
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  limits: { live: number; total: number },
): DesignDeflection {
  let liveCase: DesignCaseId | undefined;
  let liveDrops: number[] | undefined;
  for (const c of LIVE_CASES) {
    const loads = cases[c]?.jointLoads;
    if (!loads || loads.length === 0) continue;
    const drops = bottomChordDrop(prepared, profile, loads);
    if (!liveDrops || Math.max(...drops) > Math.max(...liveDrops)) {
      liveCase = c;
      liveDrops = drops;
    }
  }
  const dead = cases.D?.jointLoads;
  const totalLoads = sumLoads(dead, liveCase && cases[liveCase]!.jointLoads);
  const totalDrops = bottomChordDrop(prepared, profile, totalLoads);
  const liveName = liveCase && LABEL[liveCase]!;
  return {
    ...(liveName && { liveCase: liveName }),
    ...(liveDrops && { live: check(liveName!, liveDrops, profile, limits.live) }),
    total: check(liveName ? `D + ${liveName}` : 'D', totalDrops, profile, limits.total),
    bottomChord: profile.bottomChordJoints.map((joint, i) => ({
      joint,
      total: totalDrops[i],
      live: liveDrops ? liveDrops[i] : 0,
    })),
  };
}
