import { gableLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Howe: four panels; verticals at the quarter-points and at mid-span (king post), diagonals from
 * the mid-span bottom-chord panel point up to the top-chord quarter-points, so under gravity the
 * diagonals push and the verticals hang (common practice).
 */
export const howeLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  const q = [L / 4, L / 2, (3 * L) / 4];
  return gableLayout(p, {
    topXs: q,
    bottomXs: q,
    webs: [
      [
        ['b', 0],
        ['t', 0],
      ],
      [
        ['b', 1],
        ['t', 0],
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
    ],
    peak: 1,
  });
};
