import { describe, expect, it } from 'vitest';
import { formatFeetInches, formatInches, formatMm } from '../../../../shared/engine/format/lengths';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959), so inch inputs are exact.
const inches = (n: number) => n * 25.4;

describe('formatFeetInches', () => {
  it('prints feet, inches and a reduced sixteenth', () => {
    expect(formatFeetInches(inches(342.5))).toBe(`28'-6 1/2"`);
    expect(formatFeetInches(inches(5.5))).toBe(`0'-5 1/2"`);
    expect(formatFeetInches(inches(144))).toBe(`12'-0"`);
    expect(formatFeetInches(inches(12 + 3 / 8))).toBe(`1'-0 3/8"`);
    expect(formatFeetInches(inches(7 / 16))).toBe(`0'-0 7/16"`);
  });

  it('rounds to the nearest sixteenth and carries into the next foot', () => {
    expect(formatFeetInches(inches(143.97))).toBe(`12'-0"`);
    expect(formatFeetInches(inches(11 + 31.5 / 32))).toBe(`1'-0"`);
    expect(formatFeetInches(inches(11 + 15 / 16 + 0.02))).toBe(`0'-11 15/16"`);
    expect(formatFeetInches(inches(6 + 1 / 32 - 0.001))).toBe(`0'-6"`);
  });

  it('handles negative values and negative zero', () => {
    expect(formatFeetInches(-inches(15))).toBe(`-1'-3"`);
    expect(formatFeetInches(-0.01)).toBe(`0'-0"`);
  });

  it('honours a coarser denominator', () => {
    expect(formatFeetInches(inches(6.3), { denominator: 8 })).toBe(`0'-6 1/4"`);
    expect(formatFeetInches(inches(6.3), { denominator: 2 })).toBe(`0'-6 1/2"`);
    expect(() => formatFeetInches(10, { denominator: 0 })).toThrow(RangeError);
  });

  it('refuses non-finite lengths', () => {
    expect(() => formatFeetInches(Number.NaN)).toThrow(RangeError);
  });
});

describe('formatInches', () => {
  it('prints inches and fractions only', () => {
    expect(formatInches(inches(342.5))).toBe(`342 1/2"`);
    expect(formatInches(inches(0.625))).toBe(`5/8"`);
    expect(formatInches(-inches(3))).toBe(`-3"`);
  });
});

describe('formatMm', () => {
  it('prints whole millimetres without grouping', () => {
    expect(formatMm(8687.4)).toBe('8687 mm');
    expect(formatMm(-0.2)).toBe('0 mm');
    expect(formatMm(12.345, { decimals: 1 })).toBe('12.3 mm');
  });
});
