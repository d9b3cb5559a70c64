import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, FINK_28_OVERHANGS } from './support/inputs';

/**
 * Mid-panel deflection by hand. A 28 ft 6/12 Fink with 24 in overhangs: its bottom chord is two
 * pieces, the first (AB, 112 in = 28 ft / 3) hinged at the heel bearing and at the splice B, so
 * under its own BCDL it sags as a simple beam, 5wL⁴/(384EI), on top of the line between its
 * ends (0 at the bearing, the panel point B's drop at the other). w = 10 psf × 2 ft = 20 plf;
 * 2x4 SPF No.1/No.2: E = 1,400,000 psi (NDS 2018 Supplement Table 4A), I = 5.359 in⁴ (Table 1B).
 */
describe('deflection at mid-panel (simple-beam sag of a spliced bottom-chord panel)', () => {
  const designed = () =>
    designTruss(engineInput({ ...FINK_28_OVERHANGS, lumber: { bottomChord: '2x4 SPF-1/2' } }));
  const sag = (5 * (20 / 12) * 112 ** 4) / (384 * 1.4e6 * 5.359); // in

  it('sag 5wL⁴/(384EI) = 0.455 in; mid AB = drop at B / 2 + sag under D + Lr', () => {
    const design = designed();
    expect(sag).toBeWithin(0.4551, { abs: 1e-4 });
    const b = design.deflection.bottomChord.find((x) => x.joint === 'B')!;
    const mid = design.additional.deflection.midPanel.total;
    expect(mid.joint).toBe('mid-panel of AB');
    // 1.4e6 psi and 5.359 in⁴ are the table's rounded values: 0.1 % covers them.
    expect(mid.max / 25.4).toBeWithin(b.total / 25.4 / 2 + sag, { rel: 1e-3 });
    expect(mid.max).toBeGreaterThan(design.deflection.total.max);
    expect(mid.ratio).toBeWithin((28 * 12 * 25.4) / mid.max, { rel: 1e-12 });
  });

  it('is reported beside the panel-point checks, with its basis', () => {
    const design = designed();
    expect(design.notes.join(' ')).toMatch(/mid-length of each bottom-chord panel/);
    expect(design.additional.deflection.overhangTip?.total.limit).toBe(180);
  });
});
