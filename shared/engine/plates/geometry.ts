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

// Scratch for `areaInRectangle`: two ping-pong vertex buffers (u and v interleaved). Sized for
// the small convex pieces of contact regions; a larger ring takes the allocating path.
const SCRATCH_VERTICES = 64;
const bufferA = new Float64Array(2 * SCRATCH_VERTICES);
const bufferB = new Float64Array(2 * SCRATCH_VERTICES);

/** Clips n vertices in `src` by a·u + b·v ≥ c into `dst`; returns the new count. */
const clipInto = (
  src: Float64Array,
  n: number,
  dst: Float64Array,
  a: number,
  b: number,
  c: number,
): number => {
  let out = 0;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const pu = src[2 * i];
    const pv = src[2 * i + 1];
    const qu = src[2 * j];
    const qv = src[2 * j + 1];
    const fp = a * pu + b * pv - c;
    const fq = a * qu + b * qv - c;
    if (fp >= 0) {
      dst[2 * out] = pu;
      dst[2 * out + 1] = pv;
      out++;
    }
    if (fp >= 0 !== fq >= 0) {
      const t = fp / (fp - fq);
      dst[2 * out] = pu + t * (qu - pu);
      dst[2 * out + 1] = pv + t * (qv - pv);
      out++;
    }
  }
  return out;
};

/**
 * Area of `ring` inside the rectangle |u| ≤ halfLength, |v − offset| ≤ halfWidth (signed like
 * the ring). Allocation-free for rings of up to 60 vertices: this is the innermost step of the
 * plate search, run for every member, plate size and placement.
 */
export const areaInRectangle = (
  ring: Ring,
  halfLength: number,
  halfWidth: number,
  offset = 0,
): number => {
  let n = ring.length;
  if (n + 4 > SCRATCH_VERTICES) {
    let r = clipHalfPlane(ring, 1, 0, -halfLength);
    if (r.length > 2) r = clipHalfPlane(r, -1, 0, -halfLength);
    if (r.length > 2) r = clipHalfPlane(r, 0, 1, offset - halfWidth);
    if (r.length > 2) r = clipHalfPlane(r, 0, -1, -offset - halfWidth);
    return r.length > 2 ? signedArea(r) : 0;
  }
  for (let i = 0; i < n; i++) {
    bufferA[2 * i] = ring[i][0];
    bufferA[2 * i + 1] = ring[i][1];
  }
  n = clipInto(bufferA, n, bufferB, 1, 0, -halfLength);
  if (n > 2) n = clipInto(bufferB, n, bufferA, -1, 0, -halfLength);
  if (n > 2) n = clipInto(bufferA, n, bufferB, 0, 1, offset - halfWidth);
  if (n > 2) n = clipInto(bufferB, n, bufferA, 0, -1, -offset - halfWidth);
  if (n < 3) return 0;
  let twice = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    twice += bufferA[2 * j] * bufferA[2 * i + 1] - bufferA[2 * i] * bufferA[2 * j + 1];
  }
  return twice / 2;
};

/**
 * The strip s ∈ [s0, s1], |t| ≤ half along unit direction d (t along d turned +90°), as a
 * counter-clockwise ring.
 */
export const stripRing = (d: Point, s0: number, s1: number, half: number): Ring => {
  // n = d turned +90°: (−d.v, d.u). Written out: this runs for every member of every joint.
  const nx = -d[1];
  const ny = d[0];
  return [
    [s0 * d[0] - half * nx, s0 * d[1] - half * ny],
    [s1 * d[0] - half * nx, s1 * d[1] - half * ny],
    [s1 * d[0] + half * nx, s1 * d[1] + half * ny],
    [s0 * d[0] + half * nx, s0 * d[1] + half * ny],
  ];
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
