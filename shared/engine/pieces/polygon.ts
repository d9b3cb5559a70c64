/**
 * Convex polygon helpers for piece outlines (truss coordinates, mm). Every piece is a strip of
 * lumber cut by straight saw lines, so every outline stays convex.
 */
import { clipHalfPlane, signedArea, type Ring } from '../plates/geometry';
import type { XY } from './types';

export { signedArea, type Ring };

/** A half-plane a·x + b·y ≥ c. */
export interface HalfPlane {
  a: number;
  b: number;
  c: number;
}

/** The part of `ring` inside `h`, without repeated vertices. */
export const clip = (ring: Ring, h: HalfPlane): Ring => dedupe(clipHalfPlane(ring, h.a, h.b, h.c));

/** Drops consecutive vertices closer than 1 µm (the clip leaves them where a cut meets a corner). */
export const dedupe = (ring: Ring): Ring => {
  const out: Ring = [];
  for (const p of ring) {
    const q = out[out.length - 1];
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > 1e-3) out.push(p);
  }
  while (
    out.length > 1 &&
    Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= 1e-3
  )
    out.pop();
  return out;
};

/** Area common to two convex counter-clockwise rings, mm². */
export const overlapArea = (p: Ring, q: Ring): number => {
  let r = p;
  for (let i = 0; i < q.length && r.length > 2; i++) {
    const [x0, y0] = q[i];
    const [x1, y1] = q[(i + 1) % q.length];
    // Inside a CCW ring is to the left of each edge: (−dy)·x + dx·y ≥ (−dy)·x0 + dx·y0.
    r = clipHalfPlane(r, -(y1 - y0), x1 - x0, -(y1 - y0) * x0 + (x1 - x0) * y0);
  }
  return r.length > 2 ? Math.max(0, signedArea(r)) : 0;
};

/** The half-plane of points on the side of the line through `p` with normal `n` that holds `keep`. */
export const sideOf = (p: XY, n: XY, keep: XY): HalfPlane => {
  const c = n[0] * p[0] + n[1] * p[1];
  const s = n[0] * keep[0] + n[1] * keep[1] >= c ? 1 : -1;
  return { a: s * n[0], b: s * n[1], c: s * c };
};

/** Where the lines p + a·d and q + b·e cross; undefined when they are parallel. */
export const crossing = (p: XY, d: XY, q: XY, e: XY): XY | undefined => {
  const det = d[0] * e[1] - d[1] * e[0];
  if (Math.abs(det) < 1e-12) return undefined;
  const a = ((q[0] - p[0]) * e[1] - (q[1] - p[1]) * e[0]) / det;
  return [p[0] + a * d[0], p[1] + a * d[1]];
};

export const add = (p: XY, d: XY, k = 1): XY => [p[0] + k * d[0], p[1] + k * d[1]];
export const dot = (p: XY, q: XY): number => p[0] * q[0] + p[1] * q[1];
export const sub = (p: XY, q: XY): XY => [p[0] - q[0], p[1] - q[1]];
