import polygonClipping, { type MultiPolygon } from 'polygon-clipping';
import type { MemberRole } from '../profiles/types';
import { areaInRectangle, clipHalfPlane, stripRing, type Point, type Ring } from './geometry';

/** A member at the joint in the plate frame: unit direction away from the joint, half depth. */
export interface LocalMember {
  role: MemberRole;
  direction: Point;
  halfDepth: number;
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

/**
 * Each member's effective contact region (before the plate outline): a band of its depth along
 * its axis from the joint, less the edge exclusion, ending ½ in (the end exclusion) short of
 * every neighbour that cuts it: a mitre with members of its own rank, the band of any member
 * that runs through it. Computed once per joint; each plate size then only clips rectangles.
 */
export const memberContactRegions = (members: LocalMember[], rules: ContactRules): MultiPolygon[] =>
  members.map((m, i) => {
    const half = m.halfDepth - rules.edgeExclusion;
    if (half <= 0 || rules.reach <= rules.endExclusion) return [];
    let ring: Ring = stripRing(m.direction, rules.endExclusion, rules.reach, half);
    const cutters: Ring[] = [];
    members.forEach((o, j) => {
      if (j === i) return;
      const du = m.direction[0] - o.direction[0];
      const dv = m.direction[1] - o.direction[1];
      const len2 = du * du + dv * dv;
      if (RANK[o.role] === RANK[m.role]) {
        if (len2 < SAME_DIRECTION || ring.length < 3) return;
        const len = Math.sqrt(len2);
        // Half-plane on this member's side of the bisector, moved back by the end exclusion.
        ring = clipHalfPlane(ring, du / len, dv / len, rules.endExclusion);
      } else if (RANK[o.role] < RANK[m.role]) {
        const grown = o.halfDepth + rules.endExclusion;
        cutters.push(stripRing(o.direction, -rules.endExclusion, rules.reach, grown));
      }
    });
    if (ring.length < 3) return [];
    const own: MultiPolygon = [[close(ring)]];
    return cutters.length === 0
      ? own
      : polygonClipping.difference(own, ...cutters.map((c) => [close(c)]));
  });

// polygon-clipping wants closed rings; ours are open.
const close = (ring: Ring): Ring => [...ring, ring[0]];

/** Area of a region inside the centred plate rectangle (outer rings add, holes subtract). */
export const regionAreaInPlate = (
  region: MultiPolygon,
  halfLength: number,
  halfWidth: number,
): number => {
  let area = 0;
  for (const polygon of region) {
    polygon.forEach((ring, k) => {
      const a = Math.abs(areaInRectangle(ring as Ring, halfLength, halfWidth));
      area += k === 0 ? a : -a;
    });
  }
  return area;
};
