import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isParseError, parseLength, parsePitch } from '../../../../shared/engine/format/parse';
import { formatFeetInches, formatInches } from '../../../../shared/engine/format/lengths';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
const IN = 25.4;

const mmOf = (text: string, units: 'imperial' | 'metric' = 'imperial'): number => {
  const r = parseLength(text, units);
  if (isParseError(r)) throw new Error(`unexpected error for ${text}: ${r.error}`);
  return r;
};

describe('parseLength, imperial', () => {
  it.each([
    [`28'-6 1/2"`, 342.5],
    [`28' 6 1/2"`, 342.5],
    [`28'6.5"`, 342.5],
    [`28'`, 336],
    [`342.5"`, 342.5],
    [`342 1/2`, 342.5],
    [`28.5'`, 342],
    [`6 1/2"`, 6.5],
    [`6-1/2"`, 6.5],
    [`3/4"`, 0.75],
    [`28 ft 6 in`, 342],
    [`28’-6”`, 342],
    [`-1'-3"`, -15],
    [`  12  `, 12],
    // Feet-dash-inches without marks, as the trade writes it (common practice).
    [`28-6`, 342],
    [`28-6 1/2`, 342.5],
    [`6-1/2`, 6.5],
  ])('reads %s as %d in', (text, inches) => {
    expect(mmOf(text)).toBeWithin(inches * IN, { abs: 1e-9 });
  });

  it.each([
    ['', 'Enter a length'],
    ['abc', "Can't read"],
    [`28'-14"`, 'under 12'],
    [`6 1/0"`, '0 below the line'],
    [`6 3/2"`, 'less than 1 inch'],
    [`28'6'`, "Can't read"],
    [`"6`, "Can't read"],
    [`'6"`, "Can't read"],
    [`1.2.3`, "Can't read"],
  ])('rejects %j with a clear message', (text, message) => {
    const r = parseLength(text, 'imperial');
    expect(isParseError(r)).toBe(true);
    expect((r as { error: string }).error).toContain(message);
  });
});

describe('parseLength, metric', () => {
  it.each([
    ['8687', 8687],
    ['8687 mm', 8687],
    ['8687mm', 8687],
    ['8.687 m', 8687],
    ['868.7 cm', 8687],
    ['-50', -50],
  ])('reads %s as %d mm', (text, value) => {
    expect(mmOf(text, 'metric')).toBeWithin(value, { rel: 1e-12 });
  });

  it('rejects garbage and imperial marks', () => {
    for (const text of ['', 'eight metres', `28'`, '8 687 mm', '12 km']) {
      expect(isParseError(parseLength(text, 'metric'))).toBe(true);
    }
  });
});

describe('parsePitch', () => {
  it('reads rise per 12 in the usual spellings', () => {
    expect(parsePitch('6/12')).toBe(6);
    expect(parsePitch('6')).toBe(6);
    expect(parsePitch('6:12')).toBe(6);
    expect(parsePitch('6 in 12')).toBe(6);
    expect(parsePitch('6.5/12')).toBe(6.5);
    expect(parsePitch('4/10')).toBeWithin(4.8);
  });

  it('rejects garbage', () => {
    expect(isParseError(parsePitch(''))).toBe(true);
    expect(isParseError(parsePitch('steep'))).toBe(true);
    expect(isParseError(parsePitch('6/0'))).toBe(true);
    expect(isParseError(parsePitch('-6/12'))).toBe(true);
  });
});

describe('parse(format(x)) round trip', () => {
  // Rounding to 1/16 in loses at most 1/32 in (half a step); parsing adds no error of its own.
  const halfSixteenth = IN / 32 + 1e-9;
  const lengths = fc.double({ min: -100_000, max: 100_000, noNaN: true });

  it('feet-inches text parses back within 1/32 in', () => {
    fc.assert(
      fc.property(lengths, (x) => {
        const back = mmOf(formatFeetInches(x));
        expect(Math.abs(back - x)).toBeLessThanOrEqual(halfSixteenth);
      }),
    );
  });

  it('inch text parses back within 1/32 in', () => {
    fc.assert(
      fc.property(lengths, (x) => {
        const back = mmOf(formatInches(x));
        expect(Math.abs(back - x)).toBeLessThanOrEqual(halfSixteenth);
      }),
    );
  });
});
