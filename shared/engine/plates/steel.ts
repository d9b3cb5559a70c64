import { MM_PER_INCH, N_PER_LBF, TOLERANCE } from '../units';
import type { LocalMember } from './contact';
import { centreLineLength, type Point } from './geometry';
import type { PlateJointKind, PlateJointMember, PlateSpec, SteelCheck, SteelLine } from './types';

// Plate steel across the sections the member forces cross (ANSI/TPI 1-2014 joint design: steel
// tension, steel shear and their combination; from memory, clauses not verified). Steel values
// take no load-duration factor, so the demand is the full force. The catalog gives one tension
// and one shear value per plate; their variation with the angle of the section is not modelled.

const PLATES_PER_JOINT = 2;
// A chord runs straight through a joint when another chord leaves it within about 1° of
// straight on (as in `contact.ts`).
const THROUGH_COS = Math.cos((179 * Math.PI) / 180);
// Members closer than this (as a sine) to a section line lie along it and do not cross it.
const ALONG_LINE = 1e-6;

/**
 * One section of the plate steel: a line in the plate frame (direction `e`), the members whose
 * forces cross it, and per load case the components of the crossing force square to the line
 * (`square`, steel tension) and along it (`along`, steel shear), N, for one truss ply.
 */
export interface SteelSection {
  line: SteelLine;
  members: string;
  e: Point;
  /** Flattened [square₀, along₀, square₁, along₁, …]. */
  cases: number[];
}

/** Signed force of every member per case (tension +), or undefined when any lacks them. */
const signedCases = (members: PlateJointMember[]): (readonly number[])[] | undefined => {
  const n = members[0]?.steelForces?.length ?? 0;
  if (n === 0 || members.some((m) => m.steelForces?.length !== n)) return undefined;
  return members.map((m) => m.steelForces!);
};

/**
 * Demand cases of the members `side` (indices) crossing a line along e. With signed forces per
 * case: the force the members put on the joint, Σ Nᵢ dᵢ, split square to and along the line.
 * Without signs (only |F|): Σ |F| |dᵢ·n| and Σ |F| |dᵢ·e|, a bound.
 */
const crossing = (
  side: number[],
  local: LocalMember[],
  members: PlateJointMember[],
  e: Point,
  signed: (readonly number[])[] | undefined,
): number[] => {
  const out: number[] = [];
  if (side.length === 0) return out;
  if (signed) {
    for (let c = 0; c < signed[0].length; c++) {
      let sq = 0;
      let al = 0;
      for (const i of side) {
        const [du, dv] = local[i].direction;
        sq += signed[i][c] * (du * -e[1] + dv * e[0]);
        al += signed[i][c] * (du * e[0] + dv * e[1]);
      }
      out.push(Math.abs(sq), Math.abs(al));
    }
    return out;
  }
  let sq = 0;
  let al = 0;
  for (const i of side) {
    const [du, dv] = local[i].direction;
    const f = Math.abs(members[i].steelForce ?? members[i].force);
    sq += f * Math.abs(du * -e[1] + dv * e[0]);
    al += f * Math.abs(du * e[0] + dv * e[1]);
  }
  return [sq, al];
};

/** Members on each side of a line along e through the joint (those along it on neither). */
const sides = (local: LocalMember[], e: Point, only?: (i: number) => boolean) => {
  const plus: number[] = [];
  const minus: number[] = [];
  local.forEach((m, i) => {
    if (only && !only(i)) return;
    const cross = e[0] * m.direction[1] - e[1] * m.direction[0];
    if (cross > ALONG_LINE) plus.push(i);
    else if (cross < -ALONG_LINE) minus.push(i);
  });
  return { plus, minus };
};

const names = (idx: number[], members: PlateJointMember[]) =>
  idx.map((i) => members[i].id).join(', ');

/** Largest resultant of a case list [square, along, …]. */
const largest = (cases: number[]) => {
  let r = 0;
  for (let k = 0; k < cases.length; k += 2) r = Math.max(r, Math.hypot(cases[k], cases[k + 1]));
  return r;
};

/**
 * A line through the joint: the members of either side cross it, both sides' forces are cases
 * (they differ by what lies along the line, or, without signs, by the bound). Named by the side
 * that pushes hardest.
 */
const jointLine = (
  line: SteelLine,
  e: Point,
  local: LocalMember[],
  members: PlateJointMember[],
  signed: (readonly number[])[] | undefined,
): SteelSection[] => {
  const { plus, minus } = sides(local, e);
  if (plus.length === 0 && minus.length === 0) return [];
  const a = crossing(plus, local, members, e, signed);
  const b = crossing(minus, local, members, e, signed);
  const named = largest(a) >= largest(b) ? plus : minus;
  return [{ line, members: names(named, members), e, cases: [...a, ...b] }];
};

/**
 * The steel sections of a joint, computed once per joint (they do not depend on the plate):
 * - heel: the line along the bottom chord through the joint, crossed by the top chord (and any
 *   web on its side);
 * - splice: the line square to the more loaded chord through the joint;
 * - panel point on a through chord: the chord's face on each side with webs, crossed by those
 *   webs together (Σ Nᵢ dᵢ per case);
 * - other panel points (a peak): the line through the joint across the plate (the bisector of
 *   the chords), crossed by the members of either side.
 */
export const steelSections = (
  kind: PlateJointKind | undefined,
  local: LocalMember[],
  members: PlateJointMember[],
): SteelSection[] => {
  const signed = signedCases(members);
  if (kind === 'heel') {
    const bc = local.find((m) => m.role === 'bottomChord');
    return bc ? jointLine('heel', bc.direction, local, members, signed) : [];
  }
  if (kind === 'splice') {
    let top = -1;
    local.forEach((m, i) => {
      const f = Math.abs(members[i].steelForce ?? members[i].force);
      if (
        m.role !== 'web' &&
        (top < 0 || f > Math.abs(members[top].steelForce ?? members[top].force))
      )
        top = i;
    });
    if (top < 0) return [];
    const d = local[top].direction;
    return jointLine('splice', [-d[1], d[0]], local, members, signed);
  }
  const through = local.findIndex(
    (m, i) =>
      m.role !== 'web' &&
      local.some(
        (o, j) =>
          j !== i &&
          o.role !== 'web' &&
          m.direction[0] * o.direction[0] + m.direction[1] * o.direction[1] < THROUGH_COS,
      ),
  );
  if (through < 0) return jointLine('joint', [0, 1], local, members, signed);
  const e = local[through].direction;
  const { plus, minus } = sides(local, e, (i) => local[i].role === 'web');
  return [plus, minus]
    .filter((side) => side.length > 0)
    .map((side) => ({
      line: 'chordFace' as const,
      members: names(side, members),
      e,
      cases: crossing(side, local, members, e, signed),
    }));
};

// One object literal with every field: on Node 20, spreading a shared base into three checks
// per section cost about 40 µs a call, most of a design's time (every plate of every joint).
const steelCheck = (
  s: SteelSection,
  section: number,
  kind: SteelCheck['kind'],
  demand: number,
  capacity: number,
  ratio: number,
): SteelCheck => ({ line: s.line, member: s.members, section, kind, demand, capacity, ratio });

const ratioOf = (demand: number, capacity: number) =>
  demand === 0 ? 0 : capacity > 0 ? demand / capacity : Infinity;

/**
 * Steel tension, shear and combined checks of every section for one plate (both faces). The
 * section's steel is its line clipped by the plate (a face line runs parallel to the plate's
 * length axis, so its length is the plate's). Combined: (T/Tc)² + (V/Vc)² ≤ 1 per case
 * (ANSI/TPI 1-2014, from memory), reported as the resultant force against the resultant
 * capacity at that angle, ratio √((T/Tc)² + (V/Vc)²).
 */
export const steelChecks = (
  sections: SteelSection[],
  plate: PlateSpec,
  halfLength: number,
  halfWidth: number,
): SteelCheck[] => {
  const lbfToN = N_PER_LBF / MM_PER_INCH; // (lbf/in) · mm → N
  const out: SteelCheck[] = [];
  for (const s of sections) {
    const section = centreLineLength(s.e, halfLength, halfWidth);
    const tc = PLATES_PER_JOINT * plate.tensionValue * section * lbfToN;
    const vc = PLATES_PER_JOINT * plate.shearValue * section * lbfToN;
    let t = 0;
    let v = 0;
    let interaction = 0;
    let resultant = 0;
    for (let k = 0; k < s.cases.length; k += 2) {
      const sq = s.cases[k];
      const al = s.cases[k + 1];
      if (sq > t) t = sq;
      if (al > v) v = al;
      const i = (sq / tc) ** 2 + (al / vc) ** 2;
      if (i > interaction) {
        interaction = i;
        resultant = Math.hypot(sq, al);
      }
    }
    out.push(
      steelCheck(s, section, 'tension', t, tc, ratioOf(t, tc)),
      steelCheck(s, section, 'shear', v, vc, ratioOf(v, vc)),
    );
    const ratio = Math.sqrt(interaction);
    const capacity = ratio > TOLERANCE ? resultant / ratio : Math.min(tc, vc);
    out.push(steelCheck(s, section, 'combined', resultant, capacity, ratio));
  }
  return out;
};
