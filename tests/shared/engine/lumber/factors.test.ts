import { describe, expect, it } from 'vitest';
import {
  LOAD_DURATION_FACTOR,
  bearingAreaFactor,
  repetitiveApplies,
  sizeFactors,
} from '../../../../shared/engine/lumber';

describe('adjustment factors', () => {
  it('CD per NDS 2018 Table 2.3.2', () => {
    expect(LOAD_DURATION_FACTOR).toMatchObject({
      permanent: 0.9,
      tenYears: 1.0,
      twoMonths: 1.15,
      sevenDays: 1.25,
      tenMinutes: 1.6,
      impact: 2.0,
    });
  });

  it('CF per NDS 2018 Supplement Table 4A adjustment factors', () => {
    expect(sizeFactors('table4A', 4)).toEqual({ fb: 1.5, ft: 1.5, fc: 1.15 });
    expect(sizeFactors('table4A', 6)).toEqual({ fb: 1.3, ft: 1.3, fc: 1.1 });
    expect(sizeFactors('table4A', 8)).toEqual({ fb: 1.2, ft: 1.2, fc: 1.05 });
    expect(sizeFactors('table4A', 12)).toEqual({ fb: 1.0, ft: 1.0, fc: 1.0 });
    expect(sizeFactors('none', 4)).toEqual({ fb: 1, ft: 1, fc: 1 });
  });

  it('Cb per NDS 2018 3.10.4: (lb + 0.375)/lb, 1.0 at ends or lb ≥ 6 in', () => {
    expect(bearingAreaFactor(1.5 * 25.4, 10 * 25.4)).toBeWithin(1.25, { rel: 1e-12 });
    expect(bearingAreaFactor(3.5 * 25.4, 10 * 25.4)).toBeWithin(3.875 / 3.5, { rel: 1e-12 });
    expect(bearingAreaFactor(3.5 * 25.4, 0)).toBe(1);
    expect(bearingAreaFactor(6 * 25.4, 10 * 25.4)).toBe(1);
  });

  it('Cr applies up to 24 in. o.c. (NDS 2018 4.3.9)', () => {
    expect(repetitiveApplies(610)).toBe(true);
    expect(repetitiveApplies(24 * 25.4)).toBe(true);
    expect(repetitiveApplies(700)).toBe(false);
  });
});
