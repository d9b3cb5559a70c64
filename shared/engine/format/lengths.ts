import { MM_PER_INCH, type Mm } from '../units';

/** Options for imperial length formatting. */
export interface ImperialFormatOptions {
  /** Fractions of an inch to round to (a power of two: 2, 4, 8, 16, 32, 64). Default 16. */
  denominator?: number;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

const checkDenominator = (denominator: number): number => {
  if (!Number.isInteger(denominator) || denominator < 1 || denominator > 1024) {
    throw new RangeError(`Fraction denominator must be a whole number 1–1024, got ${denominator}`);
  }
  return denominator;
};

/**
 * Whole inches and a reduced fraction, e.g. "6 1/2", "0" or "3/8"; `units` counts 1/den inch.
 * After feet the whole inch is always shown ("1'-0 3/8\"") because that is how a tape reads.
 */
const inchesText = (units: number, den: number, showZero = false): string => {
  const whole = Math.floor(units / den);
  const num = units - whole * den;
  if (num === 0) return `${whole}`;
  const g = gcd(num, den);
  const frac = `${num / g}/${den / g}`;
  return whole === 0 && !showZero ? frac : `${whole} ${frac}`;
};

/**
 * Rounds mm to the nearest 1/den inch as an integer count; the sign is handled separately so
 * that −0.01 mm prints as 0'-0" rather than −0'-0".
 */
const toUnits = (mm: number, den: number): { negative: boolean; units: number } => {
  if (!Number.isFinite(mm)) throw new RangeError(`Cannot format a length of ${mm}`);
  const units = Math.round((Math.abs(mm) / MM_PER_INCH) * den);
  return { negative: mm < 0 && units > 0, units };
};

/**
 * Feet-inches-fractions, e.g. `28'-6 1/2"`, `0'-5 1/2"`, `12'-0"`, `-1'-3"`. Rounds to the
 * nearest 1/denominator inch first, so 11 31/32" carries into the next foot.
 */
export const formatFeetInches = (mm: Mm | number, options: ImperialFormatOptions = {}): string => {
  const den = checkDenominator(options.denominator ?? 16);
  const { negative, units } = toUnits(mm, den);
  const perFoot = 12 * den;
  const feet = Math.floor(units / perFoot);
  return `${negative ? '-' : ''}${feet}'-${inchesText(units - feet * perFoot, den, true)}"`;
};

/** Inches and fractions only, e.g. `342 1/2"`, `5/8"`, `-3"`. */
export const formatInches = (mm: Mm | number, options: ImperialFormatOptions = {}): string => {
  const den = checkDenominator(options.denominator ?? 16);
  const { negative, units } = toUnits(mm, den);
  return `${negative ? '-' : ''}${inchesText(units, den)}"`;
};

/** Options for metric length formatting. */
export interface MetricFormatOptions {
  /** Decimal places of millimetres. Default 0 (the shop measures to the millimetre). */
  decimals?: number;
}

/**
 * Millimetres without digit grouping, e.g. `8687 mm`: one spelling everywhere, and the same
 * text parses back with `parseLength(…, 'metric')`.
 */
export const formatMm = (mm: Mm | number, options: MetricFormatOptions = {}): string => {
  if (!Number.isFinite(mm)) throw new RangeError(`Cannot format a length of ${mm}`);
  const text = mm.toFixed(options.decimals ?? 0);
  // toFixed keeps the sign of −0.2 → "-0"; a length that rounds to zero has no sign.
  return `${Number(text) === 0 ? text.replace('-', '') : text} mm`;
};
