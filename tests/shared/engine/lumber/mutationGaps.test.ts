import { describe, expect, it } from 'vitest';
import { designValues } from '../../../../shared/engine/lumber/designValues';
import {
  bearingAreaFactor,
  repetitiveApplies,
  sizeFactors,
} from '../../../../shared/engine/lumber/factors';

// Checks the mutation run (README, "Mutation testing") found missing, each against NDS 2018.
const IN = 25.4;

describe('load duration factor limits (NDS 2018 Table 2.3.2: impact CD = 2.0 is the largest)', () => {
  it('takes CD = 2.0 and refuses anything above it, or zero, with a clear message', () => {
    expect(designValues('2x4 SPF-1/2', { cd: 2, repetitive: false }).factors.cd).toBe(2);
    expect(() => designValues('2x4 SPF-1/2', { cd: 2.01, repetitive: false })).toThrow(
      'Load duration factor CD must be in (0, 2]; got 2.01.',
    );
    expect(() => designValues('2x4 SPF-1/2', { cd: 0, repetitive: false })).toThrow(/in \(0, 2\]/);
  });

  it('reports the factors it used: 2x4 CF = 1.5 (Fb), 1.5 (Ft), 1.15 (Fc) (NDS 2018 Supplement Table 4A), Cr = 1.15 (§4.3.9)', () => {
    expect(designValues('2x4 SPF-1/2', { cd: 1.25, repetitive: true }).factors).toEqual({
      cd: 1.25,
      cfB: 1.5,
      cfT: 1.5,
      cfC: 1.15,
      cr: 1.15,
    });
  });
});

describe('repetitive member factor at 24 in. o.c. (NDS 2018 §4.3.9: "not more than 24 in. on center")', () => {
  it('applies at exactly 24 in and at 610 mm, not at 25 in', () => {
    expect(repetitiveApplies(24 * IN)).toBe(true);
    expect(repetitiveApplies(610)).toBe(true);
    expect(repetitiveApplies(25 * IN)).toBe(false);
  });
});

describe('size factor table (NDS 2018 Supplement Table 4A)', () => {
  it('has no entry for a 7 in nominal width (no such size) and says so', () => {
    expect(() => sizeFactors('table4A', 7)).toThrow('No size factor for a nominal width of 7 in.');
  });
});

/**
 * Bearing area factor, NDS 2018 §3.10.4 and Table 3.10.4: Cb = (lb + 0.375)/lb for lb < 6 in.
 * at least 3 in. from the member's end; e.g. lb = 1.5 in → 1.25, 3 in → 1.13 (table, rounded).
 */
describe('bearing area factor Cb (NDS 2018 §3.10.4)', () => {
  it('1.5 in and 3 in bearings 3 in or more from the end: 1.25 and 1.125', () => {
    expect(bearingAreaFactor(1.5 * IN, 3 * IN)).toBeCloseTo(1.25, 12);
    expect(bearingAreaFactor(3 * IN, 10 * IN)).toBeCloseTo(1.125, 12);
  });

  it('1.0 at an end bearing (closer than 3 in) and for bearings of 6 in or more', () => {
    expect(bearingAreaFactor(1.5 * IN, 2.9 * IN)).toBe(1);
    expect(bearingAreaFactor(6 * IN, 10 * IN)).toBe(1);
  });

  it('refuses a bearing length of zero', () => {
    expect(() => bearingAreaFactor(0, 10 * IN)).toThrow('Bearing length must be positive.');
  });
});
