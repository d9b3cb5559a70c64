import { gableLayout, gableTopY, type Layout } from './layout';
import type { ProfileParams } from './types';

/**
 * Scissor: the bottom chord rises at `bottomPitch` from each heel to a bottom-chord peak at
 * mid-span. Panel points at the mid-length of each top and bottom chord (x = L/4, 3L/4) and at
 * the two peaks; verticals join them and struts run from the bottom-chord peak to the top-chord
 * mid-points (common practice). The two bottom chords are separate pieces when they slope.
 */
export const scissorLayout = (p: ProfileParams): Layout => {
  const L = p.span;
  const bottomPitch = p.bottomPitch ?? 0;
  const q = [L / 4, L / 2, (3 * L) / 4];
  return gableLayout(p, {
    bottomY: gableTopY(L, bottomPitch, 0),
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
    bottomPeak: bottomPitch > 0 ? 1 : undefined,
  });
};
