import { repetitiveApplies } from '../lumber';
import { checkMember, type GoverningCheck, type MemberCheckInput } from '../members/checkMember';
import type { Piece, ProfileMember, TrussProfile } from '../profiles/types';
import type { MemberDemands } from './demands';

/** Everything sizing needs besides the lumber: demands, CD per combination, plies, spacing. */
export interface SizingContext {
  profile: TrussProfile;
  demands: MemberDemands;
  cds: readonly number[];
  plies: number;
  /** Cr applies to chord bending (spacing ≤ 24 in. o.c., NDS 2018 4.3.9). */
  repetitive: boolean;
  /** Webs the request braces at mid-length. */
  bracedWebs: ReadonlySet<string>;
  /** Per member index, the combinations that can govern (see `criticalCombinations`). */
  critical: readonly (readonly number[])[];
  /** Out-of-plane unbraced lengths of the chords, mm (0 or absent: braced continuously). */
  chordBracing?: { top: number; bottom: number };
  /** Amplify the panel-point moment too (NDS 2018 §3.9.2 read literally; a plant setting). */
  amplifyPanelPoint?: boolean;
}

/**
 * The combinations that can govern member k, whatever the lumber. Combination B cannot govern
 * when some A has CD_A ≤ CD_B, M_A ≥ M_B, V_A ≥ V_B and an axial force of the same sign at least as large
 * (any axial force when N_B = 0): every NDS ratio of B is then at most one of A's (capacities
 * grow with CD; the (fb − ft)/Fb** term of B is at most B's own fb/Fb′ ≤ A's). Ties keep the
 * first. Checking only these keeps sizing fast without changing any result.
 */
export function criticalCombinations(
  demands: MemberDemands,
  cds: readonly number[],
  k: number,
): number[] {
  const { axial, moment, shear, members: m } = demands;
  const n = cds.length;
  const keep: number[] = [];
  for (let b = 0; b < n; b++) {
    const nb = axial[b * m + k];
    const mb = moment[b * m + k];
    const vb = shear[b * m + k];
    let dominated = false;
    for (let a = 0; a < n && !dominated; a++) {
      if (a === b) continue;
      const na = axial[a * m + k];
      const ma = moment[a * m + k];
      const va = shear[a * m + k];
      const sameSide = nb === 0 || (nb > 0 ? na >= nb : na <= nb);
      if (!(cds[a] <= cds[b] && ma >= mb && va >= vb && sameSide)) continue;
      // Equal demands and CD: keep the earlier combination only.
      const equal = cds[a] === cds[b] && ma === mb && va === vb && na === nb;
      dominated = !equal || a < b;
    }
    if (!dominated) keep.push(b);
  }
  return keep;
}

/** The worst check of one member with one lumber over all combinations. */
export interface MemberVerdict {
  csi: number;
  /** Index of the governing combination. */
  combination: number;
  governing: GoverningCheck;
  note?: string;
}

/** A lumber (and, for a web, a brace) tried on a group of members. */
export interface SizingOption {
  lumber: string;
  braced: boolean;
}

/** The choice for one sizing group (both top chords, both bottom chords, or one web). */
export interface GroupChoice extends SizingOption {
  pass: boolean;
  /** Per member index of the group: its verdict with the chosen lumber. */
  verdicts: Map<number, MemberVerdict>;
  /** Worst over the group. */
  worst: MemberVerdict;
}

/**
 * Effective lengths, mm (NDS 2018 3.7.1): chords buckle in plane over one panel and are braced
 * out of plane by sheathing (top) or the ceiling (bottom), or else over the purlin or bracing
 * spacing of `chordBracing`; a web buckles over its length both ways unless a lateral brace at
 * mid-length halves it out of plane.
 */
export const effectiveLengths = (
  member: ProfileMember,
  braced: boolean,
  chordBracing?: { top: number; bottom: number },
) =>
  member.role === 'web'
    ? { leStrong: member.length, leWeak: braced ? member.length / 2 : member.length }
    : {
        leStrong: member.length,
        leWeak: (member.role === 'topChord' ? chordBracing?.top : chordBracing?.bottom) ?? 0,
      };

/**
 * Checks member k with one option over its critical combinations (in `order` when given).
 * With `stopAbove`, returns at the first combination whose CSI exceeds it (an early exit that
 * sizing uses to drop a candidate: the verdict is then only a lower bound).
 */
export function checkOverCombinations(
  ctx: SizingContext,
  k: number,
  option: SizingOption,
  stopAbove = Infinity,
  order?: readonly number[],
  perCombination?: Float64Array,
): MemberVerdict {
  const member = ctx.profile.members[k];
  const { leStrong, leWeak } = effectiveLengths(member, option.braced, ctx.chordBracing);
  const { axial, moment, spanMoment, supportMoment, shear, members: m } = ctx.demands;
  const repetitive = ctx.repetitive && member.role !== 'web';
  let worst: MemberVerdict = { csi: -1, combination: 0, governing: 'tension' };
  const combos = order ?? ctx.critical[k];
  for (let t = 0; t < combos.length; t++) {
    const i = combos[t];
    const check: MemberCheckInput = {
      lumberId: option.lumber,
      plies: ctx.plies,
      axial: axial[i * m + k],
      moment: moment[i * m + k],
      spanMoment: spanMoment[i * m + k],
      supportMoment: supportMoment[i * m + k],
      leStrong,
      leWeak,
      cd: ctx.cds[i],
      repetitive,
      shear: shear[i * m + k],
    };
    // Set, not spread in: this runs for every member, option and combination.
    if (ctx.amplifyPanelPoint) check.amplifyPanelPoint = true;
    // A chord held out of plane only at purlins or bracing is held at the same points against
    // lateral-torsional buckling, whichever edge its moment puts in compression (CL, §3.3.3).
    if (member.role !== 'web' && leWeak > 0) check.luBending = leWeak;
    const result = checkMember(check);
    if (perCombination) perCombination[i] = result.csi;
    if (result.csi > worst.csi) {
      worst = { csi: result.csi, combination: i, governing: result.governing };
      if (result.note) worst.note = result.note;
      if (worst.csi > stopAbove) return worst;
    }
  }
  return worst;
}

/** The options to try in order: each lumber unbraced, then (webs) with a mid-length brace. */
export function sizingOptions(lumber: readonly string[], web: boolean, forcedBrace: boolean) {
  return lumber.flatMap((id): SizingOption[] =>
    !web || forcedBrace
      ? [{ lumber: id, braced: forcedBrace }]
      : [
          { lumber: id, braced: false },
          { lumber: id, braced: true },
        ],
  );
}

/**
 * Picks the first option (cheapest first) under which every member of the group passes over all
 * combinations (CSI ≤ 1). Combinations are tried worst first, by the CSIs the first option gave,
 * and a failing option is dropped at its first failure. When none passes, every option is
 * evaluated fully and the strongest (lowest worst CSI) is kept, marked failing.
 */
export function chooseForGroup(
  ctx: SizingContext,
  memberIndices: readonly number[],
  options: readonly SizingOption[],
): GroupChoice {
  const orders = new Map<number, number[]>();
  for (const option of options) {
    const verdicts = new Map<number, MemberVerdict>();
    let pass = true;
    for (const k of memberIndices) {
      let order = orders.get(k);
      let v: MemberVerdict;
      if (!order) {
        const csis = new Float64Array(ctx.cds.length);
        v = checkOverCombinations(ctx, k, option, Infinity, undefined, csis);
        order = [...ctx.critical[k]].sort((a, b) => csis[b] - csis[a]);
        orders.set(k, order);
      } else {
        v = checkOverCombinations(ctx, k, option, 1, order);
      }
      verdicts.set(k, v);
      if (v.csi > 1) {
        pass = false;
        break;
      }
    }
    if (pass) return groupChoice(option, pass, verdicts, worstOf(verdicts));
  }
  let best: GroupChoice | undefined;
  for (const option of options) {
    const verdicts = new Map(memberIndices.map((k) => [k, checkOverCombinations(ctx, k, option)]));
    const worst = worstOf(verdicts);
    if (!best || worst.csi < best.worst.csi) best = groupChoice(option, false, verdicts, worst);
  }
  return best!;
}

// Fields written out, not `{ ...option, … }`: on Node 20 that spread cost several µs a call.
const groupChoice = (
  option: SizingOption,
  pass: boolean,
  verdicts: Map<number, MemberVerdict>,
  worst: MemberVerdict,
): GroupChoice => ({ lumber: option.lumber, braced: option.braced, pass, verdicts, worst });

const worstOf = (verdicts: Map<number, MemberVerdict>): MemberVerdict => {
  let worst: MemberVerdict | undefined;
  for (const v of verdicts.values()) if (!worst || v.csi > worst.csi) worst = v;
  return worst!;
};

/** A sizing group: pieces that share one lumber, and their members' indices. */
export interface SizingGroup {
  label: string;
  role: Piece['role'];
  pieces: Piece[];
  members: number[];
}

/**
 * Groups for sizing: all top-chord pieces together, all bottom-chord pieces together (a truss is
 * built with one chord stock per chord, so both top chords match), each web piece on its own.
 */
export function sizingGroups(profile: TrussProfile): SizingGroup[] {
  const index = new Map(profile.members.map((m, k) => [m.id, k]));
  // Plain loops, not flatMap: sizing builds its groups on every pass.
  const of = (pieces: Piece[]) => {
    const out: number[] = [];
    for (const p of pieces) for (const id of p.members) out.push(index.get(id)!);
    return out;
  };
  const top = profile.pieces.filter((p) => p.role === 'topChord');
  const bottom = profile.pieces.filter((p) => p.role === 'bottomChord');
  const webs = profile.pieces.filter((p) => p.role === 'web');
  return [
    { label: 'Top chord', role: 'topChord' as const, pieces: top, members: of(top) },
    { label: 'Bottom chord', role: 'bottomChord' as const, pieces: bottom, members: of(bottom) },
    ...webs.map((p) => ({
      label: `Web ${p.id} (${p.members.join(', ')})`,
      role: 'web' as const,
      pieces: [p],
      members: of([p]),
    })),
  ].filter((g) => g.members.length > 0);
}

/** Cr on chord bending for trusses at ≤ 24 in. o.c. (NDS 2018 4.3.9). */
export const chordRepetitive = (spacingMm: number) => repetitiveApplies(spacingMm);
