import type { PreparedFrame } from '../frame';
import type { TrussProfile } from '../profiles/types';
import type { CombinedLoads } from './combinedLoads';
import { memberDemands, type MemberDemands } from './demands';
import { designFrame } from './frameModel';
import { chordBracing } from './bracing';
import type { EngineDesignInput } from './input';
import { girderRepetitive } from './girder';
import { lumberCandidates } from './lumberChoice';
import {
  checkOverCombinations,
  chooseForGroup,
  criticalCombinations,
  sizingGroups,
  sizingOptions,
  type GroupChoice,
  type MemberVerdict,
  type SizingContext,
  type SizingGroup,
  type SizingOption,
} from './sizing';
import type { DesignOptions } from './types';

/**
 * Most sizing passes per design. The frame's forces depend on the members' stiffness, so the
 * lumber sizing picks is analysed again until the choice repeats (usually 1–2 passes).
 */
export const MAX_SIZING_PASSES = 4;

/** The sizing outcome per member index. */
export interface Sized {
  groups: { group: SizingGroup; choice: GroupChoice }[];
  lumberOf: string[];
  bracedOf: boolean[];
  verdictOf: MemberVerdict[];
}

/**
 * Per sizing-group label, the index in its role's candidate list below which sizing may not go
 * (set when a cheaper lumber passed strength but failed a service deflection).
 */
export type SizingFloors = ReadonlyMap<string, number>;

export function sizeAll(
  ctx: SizingContext,
  input: EngineDesignInput,
  options: DesignOptions,
  floors: SizingFloors = new Map(),
): Sized {
  const m = ctx.profile.members.length;
  const lumberOf = new Array<string>(m);
  const bracedOf = new Array<boolean>(m).fill(false);
  const verdictOf = new Array<MemberVerdict>(m);
  const candidatesOf = new Map<string, string[]>();
  const optionsOf = new Map<string, SizingOption[]>();
  const groups = sizingGroups(ctx.profile).map((group) => {
    let candidates = candidatesOf.get(group.role);
    if (!candidates) {
      candidates = lumberCandidates(group.role, input.lumber, options.defaultLumber);
      candidatesOf.set(group.role, candidates);
    }
    const web = group.role === 'web';
    const forced = web && group.members.some((k) => ctx.bracedWebs.has(ctx.profile.members[k].id));
    const floor = floors.get(group.label) ?? 0;
    const key = `${group.role}${forced}${floor}`;
    let tries = optionsOf.get(key);
    if (!tries) optionsOf.set(key, (tries = sizingOptions(candidates.slice(floor), web, forced)));
    const choice = chooseForGroup(ctx, group.members, tries);
    for (const k of group.members) {
      lumberOf[k] = choice.lumber;
      bracedOf[k] = choice.braced;
      verdictOf[k] = choice.verdicts.get(k)!;
    }
    return { group, choice };
  });
  return { groups, lumberOf, bracedOf, verdictOf };
}

/** Rank of a choice in its role's candidate list (later = dearer), braced after unbraced. */
function rank(candidates: readonly string[], c: SizingOption) {
  return 2 * candidates.indexOf(c.lumber) + (c.braced ? 1 : 0);
}

/**
 * Of two sizing outcomes that alternate (each analysed with the other's lumber), the dearer
 * choice per group: the cheaper one failed with the dearer one's stiffness in the frame, or it
 * would have been kept.
 */
function dearerOf(a: Sized, b: Sized, input: EngineDesignInput, options: DesignOptions): Sized {
  const m = a.lumberOf.length;
  const lumberOf = new Array<string>(m);
  const bracedOf = new Array<boolean>(m).fill(false);
  const groups = a.groups.map((ga, g) => {
    const gb = b.groups[g];
    const candidates = lumberCandidates(ga.group.role, input.lumber, options.defaultLumber);
    const choice =
      rank(candidates, gb.choice) > rank(candidates, ga.choice) ? gb.choice : ga.choice;
    for (const k of ga.group.members) {
      lumberOf[k] = choice.lumber;
      bracedOf[k] = choice.braced;
    }
    return { group: ga.group, choice };
  });
  return { groups, lumberOf, bracedOf, verdictOf: a.verdictOf };
}

/** Checks (does not size) every group with its chosen lumber against the context's demands. */
function recheck(ctx: SizingContext, chosen: Sized): Sized {
  const verdictOf = new Array<MemberVerdict>(ctx.profile.members.length);
  const groups = chosen.groups.map(({ group, choice }) => {
    const verdicts = new Map(group.members.map((k) => [k, checkOverCombinations(ctx, k, choice)]));
    let worst: MemberVerdict | undefined;
    for (const [k, v] of verdicts) {
      verdictOf[k] = v;
      if (!worst || v.csi > worst.csi) worst = v;
    }
    return { group, choice: { ...choice, verdicts, worst: worst!, pass: worst!.csi <= 1 } };
  });
  return { ...chosen, groups, verdictOf };
}

/** What `analyseAndSize` settles on: the frame with the final lumber and its demands. */
export interface FrameSizing {
  frame: PreparedFrame;
  demands: MemberDemands;
  ctx: SizingContext;
  sized: Sized;
  passes: number;
  settled: boolean;
}

/**
 * Frame analysis and sizing, repeated while sizing changes the lumber the frame was analysed
 * with (the first pass assumes the cheapest allowed lumber of each role). When two choices
 * alternate, the dearer one is analysed and checked as it is; past MAX_SIZING_PASSES the last
 * choice is. Either way the returned demands come from a frame with the returned lumber.
 */
export function analyseAndSize(
  profile: TrussProfile,
  combinations: readonly CombinedLoads[],
  input: EngineDesignInput,
  options: DesignOptions,
  floors: SizingFloors = new Map(),
): FrameSizing {
  const repetitive = girderRepetitive(input.spacing, input.plies);
  const cds = combinations.map((c) => c.cd);
  const cheapest = new Map<string, string>();
  // Chord groups start at their floor (only chords get one; see `serviceSizing`).
  for (const g of floors.size > 0 ? sizingGroups(profile) : []) {
    if (g.role === 'web') continue;
    const candidates = lumberCandidates(g.role, input.lumber, options.defaultLumber);
    cheapest.set(g.role, candidates[floors.get(g.label) ?? 0]);
  }
  let lumberOf = profile.members.map((mb) => {
    let id = cheapest.get(mb.role);
    if (id === undefined) {
      id = lumberCandidates(mb.role, input.lumber, options.defaultLumber)[0];
      cheapest.set(mb.role, id);
    }
    return id;
  });
  const contextOf = (demands: MemberDemands): SizingContext => ({
    profile,
    demands,
    cds,
    plies: input.plies,
    repetitive,
    bracedWebs: new Set(input.webBraces),
    critical: profile.members.map((_, k) => criticalCombinations(demands, cds, k)),
    chordBracing: chordBracing(input),
    ...(options.amplifyPanelPointMoment && { amplifyPanelPoint: true }),
  });
  const analyse = (lumber: readonly string[]) => {
    const frame = designFrame(profile, lumber, input.plies);
    const demands = memberDemands(profile, combinations, frame);
    return { frame, demands, ctx: contextOf(demands) };
  };
  let state = analyse(lumberOf);
  const history: Sized[] = [];
  for (let passes = 1; ; passes++) {
    const sized = sizeAll(state.ctx, input, options, floors);
    if (sized.lumberOf.every((id, k) => id === lumberOf[k])) {
      return { ...state, sized, passes, settled: true };
    }
    // A cycle: this pass chose what the pass before last chose (A → B → A).
    const before = history.at(-2);
    const cycle = before?.lumberOf.every((id, k) => id === sized.lumberOf[k]) ?? false;
    if (cycle || passes === MAX_SIZING_PASSES) {
      const chosen = cycle ? dearerOf(history.at(-1)!, sized, input, options) : sized;
      state = analyse(chosen.lumberOf);
      const checked = recheck(state.ctx, chosen);
      return { ...state, sized: checked, passes: passes + 1, settled: cycle };
    }
    history.push(sized);
    lumberOf = sized.lumberOf;
    state = analyse(lumberOf);
  }
}
