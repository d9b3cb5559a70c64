import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, HEAVY_SNOW_FINK_40, TYPICAL_LOADS } from './support/inputs';

/**
 * Plates at crowded joints of trusses a plant builds every week (common practice for the
 * geometry and loads; the plate values are the demo catalog's invented ones).
 */

describe('plates of a 24 ft 6/12 scissor with a 3/12 bottom chord', () => {
  // Joint C is the bottom-chord peak: the two bottom chords end there at an angle and three
  // webs arrive; CF and CH leave it at only 14° to the chords below them.
  const d = designTruss(
    engineInput({
      units: 'imperial',
      profile: 'scissor',
      span: 288,
      pitch: 6,
      bottomPitch: 3,
      heelHeight: 0,
      overhang: 18,
      spacing: 24,
      loads: TYPICAL_LOADS,
    }),
  );

  it('plates every joint with the demo catalog, the pointed heels with HR = 0.817', () => {
    for (const p of d.plates)
      expect({ joint: p.joint, ok: p.ok, message: p.message }).toEqual({
        joint: p.joint,
        ok: true,
        message: undefined,
      });
    // The chords meet at atan(6/12) − atan(3/12) = 12.53° (tan 0.2222): HR = 0.85 − 0.05 ·
    // (12 · 0.2222 − 2) = 0.817 (ANSI/TPI 1-2014 heel joints, from memory). The top chord's
    // share of the narrow mitred wedge at the heel alone would not hold it; its board runs on
    // into the overhang under the same plate, and those teeth hold it too.
    for (const p of d.plates.filter((x) => x.kind === 'heel')) {
      const tc = p.design!.members.find((m) => m.member === 'AF' || m.member === 'EH')!;
      expect(tc.heelFactor).toBeWithin(0.85 - 0.05 * (12 * (0.25 / 1.125) - 2), { rel: 1e-9 });
      expect(tc.ratio).toBeLessThanOrEqual(1);
    }
  });

  it('sits the bottom-chord peak plate square to the chords’ bisector, every check passing', () => {
    const c = d.plates.find((p) => p.joint === 'C')!.design!;
    // The chords are symmetric about the vertical, so the plate lies level.
    expect(Math.abs(Math.sin(c.angle))).toBeLessThan(1e-9);
    expect(c.members.map((m) => m.member).sort()).toEqual(['BC', 'CD', 'CF', 'CG', 'CH']);
    for (const m of c.members) expect(m.ratio).toBeLessThanOrEqual(1);
    // Mirror geometry, mirror areas.
    const area = (id: string) => c.members.find((m) => m.member === id)!.area;
    expect(area('CF')).toBeWithin(area('CH'), { rel: 1e-9 });
  });
});

describe('plates of the 40 ft 6/12 heavy-snow Fink', () => {
  // The same truss as the heavy-snow design test (pg = 70 psf): 2x8 chords, 2x4 webs, which meet
  // the top chords at the peak at about 30°.
  const d = designTruss(engineInput(HEAVY_SNOW_FINK_40));

  it('plates every joint, the peak included, with the demo catalog', () => {
    expect(d.plates.filter((p) => !p.ok).map((p) => p.message)).toEqual([]);
    const peak = d.plates.find((p) => p.joint === 'F')!.design!;
    expect(Math.abs(Math.sin(peak.angle))).toBeLessThan(1e-9);
    expect(peak.ratio).toBeLessThanOrEqual(1);
  });
});
