import fc from 'fast-check';
import polygonClipping from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import { regionAreaInPlate, subtractConvex } from '../../../../shared/engine/plates/contact';
import {
  areaInRectangle,
  signedArea,
  stripRing,
  type Ring,
} from '../../../../shared/engine/plates/geometry';

/**
 * The convex clipper that replaced a general polygon library in the plate search, checked
 * against that library (polygon-clipping, an independent implementation) on random strips.
 */

const close = (r: Ring): Ring => [...r, r[0]];
const libraryArea = (mp: [number, number][][][]) =>
  mp.reduce(
    (sum, poly) =>
      sum +
      poly.reduce(
        (s, ring, k) => s + (k === 0 ? 1 : -1) * Math.abs(signedArea(ring.slice(0, -1) as Ring)),
        0,
      ),
    0,
  );

const strip = fc.record({
  angle: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  s0: fc.double({ min: -20, max: 10, noNaN: true }),
  length: fc.double({ min: 20, max: 300, noNaN: true }),
  half: fc.double({ min: 5, max: 60, noNaN: true }),
});
const ringOf = (s: { angle: number; s0: number; length: number; half: number }) =>
  stripRing([Math.cos(s.angle), Math.sin(s.angle)], s.s0, s.s0 + s.length, s.half);

describe('subtractConvex', () => {
  it('a band minus other bands has the area polygon-clipping finds', () => {
    fc.assert(
      fc.property(strip, fc.array(strip, { minLength: 1, maxLength: 3 }), (own, cuts) => {
        const subject = ringOf(own);
        const cutters = cuts.map(ringOf);
        const ours = cutters.reduce(subtractConvex, [subject]);
        let theirs: ReturnType<typeof polygonClipping.difference>;
        try {
          theirs = polygonClipping.difference(
            [[close(subject)]],
            ...cutters.map((c) => [[close(c)]]),
          );
        } catch {
          // The library itself gives up on some near-degenerate inputs (e.g. bands sharing an
          // edge to 1e-16): there is no reference answer for those.
          fc.pre(false);
          return;
        }
        const area = ours.reduce((s, p) => s + Math.abs(signedArea(p)), 0);
        // Slivers of bands that coincide to 1e-7 mm leave ~1e-6 mm² that either side may keep:
        // 1e-4 mm² absolute is still a millionth of a real plate's contact area.
        expect(area).toBeWithin(libraryArea(theirs as [number, number][][][]), {
          rel: 1e-7,
          abs: 1e-4,
        });
        // Every piece is convex and counter-clockwise.
        for (const p of ours) expect(signedArea(p)).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });

  it('a slid plate counts the area inside its shifted outline', () => {
    // A 100 × 40 mm band along u centred on v = 0, inside a 60 × 60 plate slid 20 mm up:
    // the plate covers v ∈ [−10, 50], the band v ∈ [−20, 20], so 30 mm of its depth over 60 mm.
    const band: Ring = [
      [-50, -20],
      [50, -20],
      [50, 20],
      [-50, 20],
    ];
    expect(areaInRectangle(band, 30, 30, 20)).toBeWithin(60 * 30, { rel: 1e-12 });
    expect(regionAreaInPlate([band], 30, 30, -20)).toBeWithin(60 * 30, { rel: 1e-12 });
    expect(regionAreaInPlate([band], 30, 30)).toBeWithin(60 * 40, { rel: 1e-12 });
  });
});
