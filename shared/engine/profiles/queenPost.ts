import { flatBottomY, gableTopY, pitchedLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Queen post: two vertical posts at the third-points of the span, each braced by a strut from its
 * foot to the peak (common practice; our choice of triangulation). Top-chord panel points at
 * x = L/3, L/2 (peak), 2L/3; bottom chord at x = L/3 and 2L/3.
 */
export const queenPostLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  return pitchedLayout({
    span: L,
    heelHeight: p.heelHeight,
    topY: gableTopY(L, p.pitch, p.heelHeight),
    bottomY: flatBottomY,
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
    rightEnd: 'heel',
    rise: p.heelHeight + (L / 2) * (p.pitch / 12),
  });
};
