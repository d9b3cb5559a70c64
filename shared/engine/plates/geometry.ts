/**
 * Small polygon kernels for plate contact areas, in the plate's own frame (u along the plate
 * length, v across it, origin at the joint). Plain numbers: these run per keystroke.
 */

/** A point [u, v]. */
export type Point = [number, number];
/** A closed ring without the repeated first point. */
export type Ring = Point[];

/** Shoelace area, positive for counter-clockwise rings. */
export const signedArea = (ring: Ring): number => {
  let twice = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    twice += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  }
  return twice / 2;
};

/**
 * Keeps the part of `ring` where a·u + b·v ≥ c (Sutherland–Hodgman against one half-plane).
 * Exact for convex clips; a concave subject may gain zero-width edges, which add no area.
 */
export const clipHalfPlane = (ring: Ring, a: number, b: number, c: number): Ring => {
  const out: Ring = [];
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i];
    const q = ring[(i + 1) % ring.length];
    const fp = a * p[0] + b * p[1] - c;
    const fq = a * q[0] + b * q[1] - c;
    if (fp >= 0) out.push(p);
    if (fp >= 0 !== fq >= 0) {
      const t = fp / (fp - fq);
      out.push([p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1])]);
    }
  }
  return out;
};

/** Area of `ring` inside the rectangle |u| ≤ halfLength, |v − offset| ≤ halfWidth. */
export const areaInRectangle = (
  ring: Ring,
  halfLength: number,
  halfWidth: number,
  offset = 0,
): number => {
  let r = clipHalfPlane(ring, 1, 0, -halfLength);
  if (r.length > 2) r = clipHalfPlane(r, -1, 0, -halfLength);
  if (r.length > 2) r = clipHalfPlane(r, 0, 1, offset - halfWidth);
  if (r.length > 2) r = clipHalfPlane(r, 0, -1, -offset - halfWidth);
  return r.length > 2 ? signedArea(r) : 0;
};

/**
 * The strip s ∈ [s0, s1], |t| ≤ half along unit direction d (t along d turned +90°), as a
 * counter-clockwise ring.
 */
export const stripRing = (d: Point, s0: number, s1: number, half: number): Ring => {
  const n: Point = [-d[1], d[0]];
  const at = (s: number, t: number): Point => [s * d[0] + t * n[0], s * d[1] + t * n[1]];
  return [at(s0, -half), at(s1, -half), at(s1, half), at(s0, half)];
};

/**
 * Length of the line through the rectangle's centre along unit direction e, clipped by the
 * rectangle |u| ≤ halfLength, |v| ≤ halfWidth: the steel crossing a joint line there.
 */
export const centreLineLength = (e: Point, halfLength: number, halfWidth: number): number => {
  const byU = Math.abs(e[0]) > 0 ? halfLength / Math.abs(e[0]) : Infinity;
  const byV = Math.abs(e[1]) > 0 ? halfWidth / Math.abs(e[1]) : Infinity;
  return 2 * Math.min(byU, byV);
};
