import { gableLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Fink ("W"): top-chord panel points at the mid-length of each top chord (the quarter-points of
 * the span, x = L/4 and 3L/4) and the peak; bottom-chord panel points at the third-points of the
 * span. From each bottom third-point one web rises to the nearer top quarter-point and one to the
 * peak, drawing the W (common practice).
 */
export const finkLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  return gableLayout(p, {
    topXs: [L / 4, L / 2, (3 * L) / 4],
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
