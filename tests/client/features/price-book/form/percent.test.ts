import { describe, expect, it } from 'vitest';
import {
  fractionToPercent,
  percentToFraction,
} from '../../../../../src/features/price-book/form/percent';

// 1 % = 1/100 by definition of per cent (common practice); the helpers only scale and round.
describe('percent ↔ fraction', () => {
  it('shows stored fractions as the percentages people type', () => {
    expect(fractionToPercent(0.25)).toBe(25);
    expect(fractionToPercent(0.5)).toBe(50);
    expect(fractionToPercent(0)).toBe(0);
    expect(fractionToPercent(1)).toBe(100);
  });

  it('hides binary floating-point noise (0.07 × 100 is 7.000000000000001 in IEEE 754)', () => {
    expect(0.07 * 100).not.toBe(7);
    expect(fractionToPercent(0.07)).toBe(7);
    expect(fractionToPercent(0.0825)).toBe(8.25);
    expect(fractionToPercent(0.295)).toBe(29.5);
  });

  it('sends typed percentages as 0–1 fractions', () => {
    expect(percentToFraction(25)).toBe(0.25);
    expect(percentToFraction(7.5)).toBe(0.075);
    expect(percentToFraction(8.25)).toBe(0.0825);
    expect(percentToFraction(100)).toBe(1);
  });

  it('round-trips every hundredth of a percent from 0 to 100 %', () => {
    for (let hundredths = 0; hundredths <= 10_000; hundredths += 1) {
      const percent = hundredths / 100;
      expect(fractionToPercent(percentToFraction(percent))).toBe(percent);
    }
  });

  it('keeps an empty number field (NaN) empty, so the schema can say "must be a number"', () => {
    expect(percentToFraction(Number.NaN)).toBeNaN();
    expect(fractionToPercent(Number.NaN)).toBeNaN();
  });
});
