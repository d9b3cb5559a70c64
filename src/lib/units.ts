/** A plant's unit system, as the API reports it (shared/api/plant.ts). */
export type UnitSystem = 'imperial' | 'metric';

/** The unit of area loads (TCLL, ground snow, …) in a plant's units: psf or kPa. */
export function areaLoadUnit(units: UnitSystem): 'psf' | 'kPa' {
  return units === 'imperial' ? 'psf' : 'kPa';
}

/** Formats an area load with its unit ("20 psf", "0.96 kPa"); '—' when there is none. */
export function formatAreaLoad(value: number | null | undefined, units: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  // psf values are whole or one decimal; kPa needs two decimals to be useful (0.96 kPa).
  const digits = units === 'imperial' ? 1 : 2;
  const text = Number(value.toFixed(digits)).toString();
  return `${text} ${areaLoadUnit(units)}`;
}

/**
 * Reads an optional number from a form input: empty is "not given" (`emptyAs`), anything else is
 * `Number(text)` so junk becomes NaN and the shared schema reports "… must be a number".
 */
export function optionalNumberFromInput<E extends null | undefined>(
  value: unknown,
  emptyAs: E,
): number | E {
  if (value === null || value === undefined) return emptyAs;
  if (typeof value === 'number') return value;
  const text = String(value).trim();
  return text === '' ? emptyAs : Number(text);
}
