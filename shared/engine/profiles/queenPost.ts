import { gableLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Queen post: two vertical posts at the third-points of the span, each braced by a strut from its
 * foot to the peak (common practice; our choice of triangulation). Top-chord panel points at
 * x = L/3, L/2 (peak), 2L/3; bottom chord at x = L/3 and 2L/3.
 */
export const queenPostLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  return gableLayout(p, {
    topXs: [L / 3, L / 2, (2 * L) / 3],
    bottomXs: [L / 3, (2 * L) / 3],
    webs: [
      [
        ['b', 0],
        ['t', 0],
      ],
      [
        ['b', 0],
        ['t', 1],
      ],
      [
        ['b', 1],
        ['t', 1],
      ],
      [
        ['b', 1],
        ['t', 2],
      ],
    ],
    peak: 1,
  });
};
