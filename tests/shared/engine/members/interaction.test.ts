import { describe, expect, it } from 'vitest';
import { compressionBendingIndex, tensionBendingIndex } from '../../../../shared/engine/members';

describe('NDS 2018 3.9.2 compression + bending (uniaxial)', () => {
  it('Example C, D + W (MST course 5260, Problem 7.32; engineering.md §2): 0.488', () => {
    // psi: fc = 1,067 lb / 8.25 in²; Fc′ = 2,640 × Cp 0.1972; fb = 5,880 lb·in / 7.563 in³;
    // Fb′ = 2,392; FcE = 546.2.
    const r = compressionBendingIndex(1066.67 / 8.25, 2640 * 0.1972, 5880 / 7.563, 2392, 546.2);
    expect(r.buckles).toBe(false);
    expect(r.index).toBeWithin(0.488, { abs: 6e-4 });
  });

  it('fc ≥ FcE gives a failing index', () => {
    expect(compressionBendingIndex(10, 5, 1, 10, 8)).toEqual({ index: 4, buckles: true });
  });
});

describe('NDS 2018 3.9.1 tension + bending', () => {
  it('the larger of ft/Ft′ + fb/Fb* and (fb − ft)/Fb**', () => {
    expect(tensionBendingIndex(1, 10, 9, 10)).toBeWithin(1.0);
    expect(tensionBendingIndex(0, 10, 12, 10)).toBeWithin(1.2);
    expect(tensionBendingIndex(2, 10, 6, 10, 5)).toBeWithin(Math.max(0.8, 0.8));
  });
});
