import type { PreparedFrame } from '../frame';
import type { CaseLoads } from '../loads';
import type { TrussProfile } from '../profiles/types';
import { longTermDeflection } from './additionalChecks';
import type { CombinedLoads, DesignCaseId } from './combinedLoads';
import { solveDeflection } from './deflection';
import { designFrame, memberSection } from './frameModel';
import { analyseAndSize, type FrameSizing } from './frameSizing';
import type { EngineDesignInput } from './input';
import { lumberCandidates } from './lumberChoice';
import { serviceDeflection, type ServiceDeflection } from './serviceDeflection';
import type { DeflectionCheck, DesignDeflection, DesignOptions } from './types';

/** Every service deflection of a frame with its lumber (no strength checks). */
export interface ServiceState {
  deflection: DesignDeflection;
  longTerm: DeflectionCheck;
  service: ServiceDeflection;
}

/** A chord that sizing raised above what strength needs, and the check that made it. */
export interface DeflectionSizing {
  /** Sizing group label, e.g. "Top chord". */
  group: string;
  lumber: string;
  /** The failing check before the raise, e.g. "D + Lr at the right overhang tip". */
  check: string;
}

/**
 * Panel-point (live, total, long-term), mid-panel and overhang-tip deflection of one frame. The
 * live and total load sets are solved once and shared by all of them.
 */
export function serviceState(
  frame: PreparedFrame,
  profile: TrussProfile,
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  limits: { live: number; total: number },
): ServiceState {
  const solved = solveDeflection(frame, profile, cases, limits);
  const { deflection } = solved;
  return {
    deflection,
    longTerm: longTermDeflection(deflection, profile.params.span, limits.total),
    service: serviceDeflection(frame, profile, cases, deflection, limits, solved),
  };
}

/** The state's checks: panel points live and total, long-term, mid-panel, overhang tip. */
export function serviceChecks(s: ServiceState): DeflectionCheck[] {
  return [
    s.deflection.live,
    s.deflection.total,
    s.longTerm,
    s.service.midPanel.live,
    s.service.midPanel.total,
    s.service.overhangTip?.live,
    s.service.overhangTip?.total,
  ].filter((c) => c !== undefined);
}

/** Δ over its allowance: limit / ratio (0 when nothing moves). */
const demand = (c: DeflectionCheck) => (c.ratio === Infinity ? 0 : c.limit / c.ratio);

/** How far a state is from passing: the sum of each check's excess over 1, and the worst. */
function shortfall(s: ServiceState) {
  let excess = 0;
  let worst: DeflectionCheck | undefined;
  for (const c of serviceChecks(s)) {
    const d = demand(c);
    excess += Math.max(0, d - 1);
    if (!worst || d > demand(worst)) worst = c;
  }
  return { excess, worst };
}

/** Bending stiffness E·I of a lumber id with `plies`, N·mm². */
const stiffness = (id: string, plies: number) => {
  const s = memberSection(id, plies);
  return s.e * s.i;
};

/** Strength sizing plus the service deflections, and the chords raised to pass them. */
export interface ServiceSizing extends FrameSizing {
  state: ServiceState;
  raised: DeflectionSizing[];
}

/**
 * Sizes for strength (`analyseAndSize`), then for service deflection: while a deflection check
 * fails, each chord group is tried with the next dearer candidate that is stiffer (larger E·I)
 * than its current lumber, and the one that cuts the total excess most becomes that group's
 * floor; strength sizing then runs again from the floors. Webs are not raised (their axial
 * stiffness rarely governs a truss's deflection). Ends when every check passes, or when no chord
 * can go stiffer or none helps (the design then fails on the check, as before).
 */
export function sizeForService(
  profile: TrussProfile,
  combinations: readonly CombinedLoads[],
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  input: EngineDesignInput,
  options: DesignOptions,
): ServiceSizing {
  const floors = new Map<string, number>();
  const raised: DeflectionSizing[] = [];
  for (;;) {
    const sizing = analyseAndSize(profile, combinations, input, options, floors);
    const state = serviceState(sizing.frame, profile, cases, input.deflection);
    const now = shortfall(state);
    if (now.excess === 0) return { ...sizing, state, raised };
    let best: { label: string; index: number; lumber: string; excess: number } | undefined;
    for (const { group, choice } of sizing.sized.groups) {
      if (group.role === 'web') continue;
      const candidates = lumberCandidates(group.role, input.lumber, options.defaultLumber);
      const from = stiffness(choice.lumber, input.plies);
      const index = candidates.findIndex(
        (id, n) => n > candidates.indexOf(choice.lumber) && stiffness(id, input.plies) > from,
      );
      if (index < 0) continue;
      const members = new Set(group.members);
      const lumberOf = sizing.sized.lumberOf.map((id, k) =>
        members.has(k) ? candidates[index] : id,
      );
      const trial = serviceState(
        designFrame(profile, lumberOf, input.plies),
        profile,
        cases,
        input.deflection,
      );
      const { excess } = shortfall(trial);
      if (excess < now.excess && (!best || excess < best.excess)) {
        best = { label: group.label, index, lumber: candidates[index], excess };
      }
    }
    if (!best) return { ...sizing, state, raised };
    floors.set(best.label, best.index);
    const w = now.worst!;
    raised.push({ group: best.label, lumber: best.lumber, check: `${w.load} at ${w.joint}` });
  }
}
