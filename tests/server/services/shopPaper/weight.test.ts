import { describe, expect, it } from 'vitest';
import type { PresentedDesign } from '../../../../shared/engine/design';
import {
  lumberDensityPcf,
  trussWeightLb,
  weightIn,
} from '../../../../server/services/shopPaper/weight';

const piece = (lumber: string, value: number) => ({
  mark: 'X',
  role: 'web',
  lumber,
  length: { value, text: '' },
  members: [],
  splices: [],
  csi: 0,
  failing: false,
});

describe('truss weight', () => {
  it('uses the species group’s specific gravity at 19 % moisture', () => {
    // G = 0.42 (SPF), 0.50 (DF-L), 0.55 (SP): NDS 2018 Table 12.3.3A (from memory).
    expect(lumberDensityPcf('2x4 SPF-1/2')).toBeCloseTo(0.42 * 62.4 * 1.19, 6);
    expect(lumberDensityPcf('2x6 DFL-2')).toBeCloseTo(0.5 * 62.4 * 1.19, 6);
    expect(lumberDensityPcf('2x4 SP-2')).toBeCloseTo(0.55 * 62.4 * 1.19, 6);
    expect(lumberDensityPcf('2x4 Oak')).toBeNull();
  });

  it('weighs dressed volume × density × plies (hand arithmetic)', () => {
    // A 10 ft 2x4 SPF: 1.5 × 3.5 × 120 in³ = 0.36458 ft³ × 31.187 lb/ft³ = 11.37 lb.
    const design = {
      units: { length: 'in' },
      pieces: [piece('2x4 SPF-1/2', 120)],
    } as unknown as PresentedDesign;
    expect(trussWeightLb(design, 1)).toBeCloseTo(11.37, 2);
    expect(trussWeightLb(design, 3)).toBeCloseTo(3 * 11.37, 1);
    // The same piece in mm (3048 mm).
    const metric = {
      units: { length: 'mm' },
      pieces: [piece('2x4 SPF-1/2', 3048)],
    } as unknown as PresentedDesign;
    expect(trussWeightLb(metric, 1)).toBeCloseTo(11.37, 2);
  });

  it('prints whole pounds or kilograms', () => {
    expect(weightIn(77.6, 'imperial')).toEqual({ value: 78, unit: 'lb', text: 'est. 78 lb' });
    expect(weightIn(100, 'metric')).toEqual({ value: 45, unit: 'kg', text: 'est. 45 kg' });
  });
});
