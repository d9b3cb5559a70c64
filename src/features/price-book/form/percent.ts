/**
 * Percent ↔ fraction for the price book form: people type 25 (%), the API stores 0.25.
 * Both directions round to 1e-9 so binary floating point never shows as 7.000000000000001 %.
 */
const PRECISION = 1e9;

const round = (value: number) => Math.round(value * PRECISION) / PRECISION;

/** A stored fraction (0.25) as the percentage a person edits (25). NaN stays NaN. */
export function fractionToPercent(fraction: number): number {
  return round(fraction * 100);
}

/** A typed percentage (25) as the fraction the API stores (0.25). NaN stays NaN. */
export function percentToFraction(percent: number): number {
  return round(percent / 100);
}
