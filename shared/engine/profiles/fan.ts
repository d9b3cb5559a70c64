import { gableLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Fan: bottom-chord panel points at the third-points of the span; top-chord panel points at the
 * third-points of each top chord (x = L/6, L/3, L/2 peak, 2L/3, 5L/6). Three webs fan out from each
 * bottom third-point: to the two top panel points of its side and to the peak (common practice).
 */
export const fanLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  return gableLayout(p, {
    topXs: [L / 6, L / 3, L / 2, (2 * L) / 3, (5 * L) / 6],
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
        ['b', 0],
        ['t', 2],
      ],
      [
        ['b', 1],
        ['t', 2],
      ],
      [
        ['b', 1],
        ['t', 3],
      ],
      [
        ['b', 1],
        ['t', 4],
      ],
    ],
    peak: 2,
  });
};
