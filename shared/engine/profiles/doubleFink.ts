import { gableLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Double Fink ("WW"): top-chord panel points at the third-points of each top chord (x = L/6, L/3,
 * L/2 peak, 2L/3, 5L/6), bottom-chord panel points at the fifth-points of the span. Eight webs
 * zig-zag between them from heel to heel, drawing two W's (common practice).
 */
export const doubleFinkLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  return gableLayout(p, {
    topXs: [L / 6, L / 3, L / 2, (2 * L) / 3, (5 * L) / 6],
    bottomXs: [L / 5, (2 * L) / 5, (3 * L) / 5, (4 * L) / 5],
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
      [
        ['b', 2],
        ['t', 2],
      ],
      [
        ['b', 2],
        ['t', 3],
      ],
      [
        ['b', 3],
        ['t', 3],
      ],
      [
        ['b', 3],
        ['t', 4],
      ],
    ],
    peak: 2,
  });
};
