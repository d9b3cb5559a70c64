import { solveFrame, type FrameLoads, type FrameResult, type PreparedFrame } from '../frame';
import type { CaseLoads } from '../loads';
import { designValues, parseLumberId, sectionProperties } from '../lumber';
import type { TrussProfile } from '../profiles/types';
import type { DesignCaseId } from './combinedLoads';
import { caseFrameLoads } from './frameModel';
import type { DeflectionCheck, DesignDeflection } from './types';

/** Axial stiffness E·A of a lumber id with `plies` side by side, N (E in MPa × A in mm²). */
export function axialStiffness(lumberId: string, plies: number): number {
  const { size } = parseLumberId(lumberId);
  // E takes no CD (NDS 2018 Table 4.3.1), so any CD gives the same modulus.
  return (
    designValues(lumberId, { cd: 1, repetitive: false }).e * sectionProperties(size, plies).area
  );
}

const LIVE_CASES: DesignCaseId[] = ['Lr', 'S', 'L', 'Lbc'];
const LABEL: Partial<Record<DesignCaseId, string>> = { Lr: 'Lr', S: 'S', L: 'L', Lbc: 'L(bc)' };

/** One solved load set: its frame loads and the frame's answer. */
export interface SolvedSet {
  loads: FrameLoads;
  result: FrameResult;
}

/** Downward vertical displacement of each bottom-chord joint, mm (down +), and the solution. */
function bottomChordDrop(
  frame: PreparedFrame,
  profile: TrussProfile,
  terms: readonly (readonly [CaseLoads | undefined, number])[],
): { drops: number[]; solved: SolvedSet } {
  const loads = caseFrameLoads(profile, terms);
  const result = solveFrame(frame, loads);
  const drops = profile.bottomChordJoints.map(
    (j) => -result.displacements[frame.jointIndex.get(j)!].uy,
  );
  return { drops, solved: { loads, result } };
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
 * Live and total-load deflection of the bottom-chord panel points from the design frame with
 * the chosen lumber (the same factorised stiffness as the member forces: axial and bending
 * strain, no joint slip or creep). Live is the unfactored live case (Lr, S, L or L(bc)) that
 * deflects most; total is dead plus that live case. Limits are span/n.
 */
export function designDeflection(
  frame: PreparedFrame,
  profile: TrussProfile,
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  limits: { live: number; total: number },
): DesignDeflection {
  return solveDeflection(frame, profile, cases, limits).deflection;
}

/**
 * `designDeflection` with the solved live and total load sets, so the service checks reuse them
 * instead of solving the same sets again.
 */
export function solveDeflection(
  frame: PreparedFrame,
  profile: TrussProfile,
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  limits: { live: number; total: number },
): { deflection: DesignDeflection; live?: SolvedSet; total: SolvedSet } {
  let liveCase: DesignCaseId | undefined;
  let liveDrops: number[] | undefined;
  let live: SolvedSet | undefined;
  for (const c of LIVE_CASES) {
    if (!cases[c] || cases[c].jointLoads.length + (cases[c].pointLoads?.length ?? 0) === 0)
      continue;
    const one = bottomChordDrop(frame, profile, [[cases[c], 1]]);
    if (!liveDrops || Math.max(...one.drops) > Math.max(...liveDrops)) {
      liveCase = c;
      liveDrops = one.drops;
      live = one.solved;
    }
  }
  const total = bottomChordDrop(frame, profile, [
    [cases.D, 1],
    [liveCase && cases[liveCase], 1],
  ]);
  const totalDrops = total.drops;
  const liveName = liveCase && LABEL[liveCase]!;
  const deflection: DesignDeflection = {
    ...(liveName && { liveCase: liveName }),
    ...(liveDrops && { live: check(liveName!, liveDrops, profile, limits.live) }),
    total: check(liveName ? `D + ${liveName}` : 'D', totalDrops, profile, limits.total),
    bottomChord: profile.bottomChordJoints.map((joint, i) => ({
      joint,
      total: totalDrops[i],
      live: liveDrops ? liveDrops[i] : 0,
    })),
  };
  return { deflection, ...(live && { live }), total: total.solved };
}
