import type { Layout, Point } from './layout';
import type { ProfileParams } from './types';

/**
 * Flat (parallel chord), Pratt web layout: `panels` equal panels (even), verticals at every panel
 * point including both ends, and one diagonal per panel sloping down toward mid-span, so under
 * gravity every diagonal pulls and every vertical pushes (common practice). Points are numbered
 * bottom chord left to right, then top chord left to right.
 */
export const flatLayout = (p: ProfileParams): Layout => {
  const n = p.panels ?? 0;
  const depth = p.depth ?? 0;
  const w = p.span / n;
  const points: Point[] = [];
  for (let i = 0; i <= n; i++) points.push({ x: i * w, y: 0 });
  for (let i = 0; i <= n; i++) points.push({ x: i * w, y: depth });
  const bottom = Array.from({ length: n + 1 }, (_, i) => i);
  const top = Array.from({ length: n + 1 }, (_, i) => n + 1 + i);
  const webs: Array<readonly [number, number]> = [];
  for (let i = 0; i <= n; i++) webs.push([bottom[i], top[i]]);
  for (let i = 0; i < n; i++) {
    // Left half: from the top at x_i down to the bottom at x_{i+1}; right half mirrored.
    webs.push(i < n / 2 ? [top[i], bottom[i + 1]] : [bottom[i], top[i + 1]]);
  }
  return { points, top, bottom, webs, topBreaks: [], bottomBreaks: [], rise: depth };
};
