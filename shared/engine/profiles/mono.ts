import { flatBottomY, pitchedLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Mono-pitch: the top chord rises from the low heel at x = 0 to the tall end at x = span, which
 * always has its own vertical. Top-chord panel points at the third-points of the span, one
 * bottom-chord panel point at mid-span; the webs zig-zag heel → L/3 top → L/2 bottom → 2L/3 top →
 * tall-end bearing (common practice).
 */
export const monoLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  const topY = (x: number): number => p.heelHeight + (x * p.pitch) / 12;
  return pitchedLayout({
    span: L,
    heelHeight: p.heelHeight,
    topY,
    bottomY: flatBottomY,
    topXs: [L / 3, (2 * L) / 3],
    bottomXs: [L / 2],
    webs: [
      [
        ['t', 0],
        ['b', 0],
      ],
      [
        ['b', 0],
        ['t', 1],
      ],
      // The last web ends on the tall-end bearing, which is bottom point index 1 (the right end).
      [
        ['t', 1],
        ['b', 1],
      ],
    ],
    rightEnd: 'tallEnd',
    rise: topY(L),
  });
};
