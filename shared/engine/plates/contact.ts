import type { MemberRole } from '../profiles/types';
import {
  areaInRectangle,
  clipHalfPlane,
  signedArea,
  stripRing,
  type Point,
  type Ring,
} from './geometry';

/**
 * A contact region as disjoint convex pieces (each an open counter-clockwise ring). Convex
 * pieces keep every later step a half-plane clip: no general polygon boolean is needed.
 */
export type Region = Ring[];

/** A member at the joint in the plate frame: unit direction away from the joint, half depth. */
export interface LocalMember {
  role: MemberRole;
  direction: Point;
  halfDepth: number;
  /** How far the lumber runs from the joint, mm, when it ends within the plate (an overhang). */
  length?: number;
}

/** Tooth-free margins and how far from the joint the lumber bands need to reach (all mm). */
export interface ContactRules {
  endExclusion: number;
  edgeExclusion: number;
  reach: number;
}

// Which lumber runs through at a joint: webs stop at the chords (common practice). Chords
// meeting chords (heel, peak, splice) share the overlap on the bisector, a mitre: the line
// model puts the joint on both centre lines, so neither band may claim the other's wood.
const RANK: Record<MemberRole, number> = { bottomChord: 0, topChord: 0, web: 1 };

// Directions closer than this (radians², roughly) are treated as the same line.
const SAME_DIRECTION = 1e-12;

// A chord continues through the joint when another chord leaves it within about 1° of straight
// on: one board (or a butt splice), which no web may cut into.
const THROUGH_COS = Math.cos((179 * Math.PI) / 180);

// A web that meets a chord ending at the joint at less than 45° is mitred with it on their
// bisector instead of butting it: a butt cut that shallow leaves a tapered web end longer than
// the web is deep (a feather edge), which shops avoid (common practice). Steeper webs butt the
// chord, which keeps its full band.
const MITRE_COS = Math.cos(Math.PI / 4);

/** For each member: is it a chord that runs straight through the joint? */
const runsThrough = (members: LocalMember[]): boolean[] =>
  members.map((m, i) =>
    m.role === 'web'
      ? false
      : members.some(
          (o, j) =>
            j !== i &&
            o.role !== 'web' &&
            m.direction[0] * o.direction[0] + m.direction[1] * o.direction[1] < THROUGH_COS,
        ),
  );

/**
 * Each member's effective contact region (before the plate outline): a band of its depth along
 * its axis from the joint, less the edge exclusion, ending ½ in (the end exclusion) short of
 * every neighbour that cuts it. Members of one rank (chord–chord, web–web) share their overlap
 * on the bisector; so do a web and a chord that ends at the joint when they meet at under 45°.
 * Otherwise the web stops ½ in short of the chord's band, which keeps its wood. Computed once
 * per joint; each plate size and placement then only clips rectangles.
 */
export const memberContactRegions = (members: LocalMember[], rules: ContactRules): Region[] => {
  const through = runsThrough(members);
  const out: Region[] = [];
  for (let i = 0; i < members.length; i++) out.push(contactRegion(members, through, i, rules));
  return out;
};

/** The contact region of member i (plain loops: this runs for every member of every joint). */
const contactRegion = (
  members: LocalMember[],
  through: boolean[],
  i: number,
  rules: ContactRules,
): Region => {
  const m = members[i];
  const half = m.halfDepth - rules.edgeExclusion;
  // A board that ends within reach loses the end exclusion at its far end too.
  const reach =
    m.length === undefined ? rules.reach : Math.min(rules.reach, m.length - rules.endExclusion);
  if (half <= 0 || reach <= rules.endExclusion) return [];
  let ring: Ring = stripRing(m.direction, rules.endExclusion, reach, half);
  const cutters: Ring[] = [];
  for (let j = 0; j < members.length; j++) {
    if (j === i) continue;
    const o = members[j];
    const du = m.direction[0] - o.direction[0];
    const dv = m.direction[1] - o.direction[1];
    const len2 = du * du + dv * dv;
    const cos = m.direction[0] * o.direction[0] + m.direction[1] * o.direction[1];
    const chord = RANK[o.role] < RANK[m.role] ? j : RANK[o.role] > RANK[m.role] ? i : -1;
    const mitre = chord < 0 || (!through[chord] && cos > MITRE_COS);
    if (mitre) {
      if (len2 < SAME_DIRECTION || ring.length < 3) continue;
      const len = Math.sqrt(len2);
      // Half-plane on this member's side of the bisector, moved back by the end exclusion.
      ring = clipHalfPlane(ring, du / len, dv / len, rules.endExclusion);
    } else if (chord === j) {
      const grown = o.halfDepth + rules.endExclusion;
      cutters.push(stripRing(o.direction, -rules.endExclusion, rules.reach, grown));
    }
  }
  if (ring.length < 3) return [];
  let region: Region = [ring];
  for (const cut of cutters) region = subtractConvex(region, cut);
  return region;
};

// Pieces thinner than this (mm²) are rounding slivers of a cut along a shared edge.
const SLIVER_AREA = 1e-9;

/** 1 when every vertex has a·u + b·v > c, −1 when every one has < c, else 0. */
const sideOf = (ring: Ring, a: number, b: number, c: number): number => {
  let above = 0;
  let below = 0;
  for (const p of ring) {
    const f = a * p[0] + b * p[1] - c;
    if (f > 0) above++;
    else if (f < 0) below++;
  }
  return above === ring.length ? 1 : below === ring.length ? -1 : 0;
};

/**
 * Removes the convex polygon `cut` from disjoint convex pieces. For each piece, the part outside
 * edge i of `cut` but inside edges 0…i−1 is convex, and these parts are disjoint and together
 * make piece − cut exactly.
 */
export const subtractConvex = (pieces: Region, cut: Ring): Region => {
  const ccw = signedArea(cut) >= 0 ? cut : [...cut].reverse();
  const out: Region = [];
  for (const piece of pieces) {
    let inside: Ring = piece;
    for (let i = 0; i < ccw.length; i++) {
      const p = ccw[i];
      const q = ccw[(i + 1) % ccw.length];
      // Inside the cut: a·u + b·v ≥ c.
      const a = p[1] - q[1];
      const b = q[0] - p[0];
      const c = a * p[0] + b * p[1];
      // Wholly on one side of the edge (the usual case): nothing to clip, nothing to allocate.
      const whole = sideOf(inside, a, b, c);
      if (whole > 0) continue;
      if (whole < 0) {
        if (Math.abs(signedArea(inside)) > SLIVER_AREA) out.push(inside);
        break;
      }
      const outside = clipHalfPlane(inside, -a, -b, -c);
      if (outside.length > 2 && Math.abs(signedArea(outside)) > SLIVER_AREA) out.push(outside);
      inside = clipHalfPlane(inside, a, b, c);
      if (inside.length < 3) break;
    }
  }
  return out;
};

/**
 * Area of a region (disjoint convex pieces) inside the plate rectangle |u| ≤ halfLength,
 * |v − offset| ≤ halfWidth (the plate slid `offset` across its axis).
 */
export const regionAreaInPlate = (
  region: Region,
  halfLength: number,
  halfWidth: number,
  offset = 0,
): number => {
  let area = 0;
  for (const piece of region) {
    area += Math.abs(areaInRectangle(piece, halfLength, halfWidth, offset));
  }
  return area;
};
