import { flatBottomY, gableTopY, pitchedLayout, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * King post: one vertical from the bottom-chord mid-span panel point to the peak (common practice).
 * Top-chord panel points: heels and peak; bottom chord: heels and mid-span.
 */
export const kingPostLayout = (p: ProfileParams): Layout => {
  const h = p.span / 2;
  return pitchedLayout({
    span: p.span,
    heelHeight: p.heelHeight,
    topY: gableTopY(p.span, p.pitch, p.heelHeight),
    bottomY: flatBottomY,
    topXs: [h],
    bottomXs: [h],
    webs: [
      [
        ['b', 0],
        ['t', 0],
      ],
    ],
    peak: 0,
    rightEnd: 'heel',
    rise: p.heelHeight + (h * p.pitch) / 12,
  });
};
