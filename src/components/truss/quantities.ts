import { formatFeetInches, formatMm } from '../../../shared/engine/format';
import { N_PER_LBF } from '../../../shared/engine/units';

/** The unit system a plant works in. */
export type PlantUnits = 'imperial' | 'metric';

/** A length in the plant's units: `28'-6 1/2"` or `8687 mm`. */
export function formatLength(mm: number, units: PlantUnits): string {
  return units === 'imperial' ? formatFeetInches(mm) : formatMm(mm);
}

/** A force magnitude in the plant's units: whole lbf ("1,234 lbf") or kN to 0.01 ("5.49 kN"). */
export function formatForceMagnitude(n: number, units: PlantUnits): string {
  const v = Math.abs(n);
  return units === 'imperial'
    ? `${Math.round(v / N_PER_LBF).toLocaleString('en-US')} lbf`
    : `${(v / 1000).toFixed(2)} kN`;
}

/** Tension or compression of an axial force (tension positive); "—" below 0.5 N (no force). */
export function forceSense(n: number): 'T' | 'C' | '—' {
  if (Math.abs(n) < 0.5) return '—';
  return n > 0 ? 'T' : 'C';
}

/** An axial force with its sense, e.g. "1,234 lbf C". */
export function formatAxialForce(n: number | undefined, units: PlantUnits): string {
  if (n === undefined || !Number.isFinite(n)) return '—';
  const sense = forceSense(n);
  return sense === '—'
    ? `0 ${units === 'imperial' ? 'lbf' : 'kN'}`
    : `${formatForceMagnitude(n, units)} ${sense}`;
}

/** A pitch as rise per 12, e.g. "6/12" or "4.5/12". */
export function formatPitch(risePer12: number): string {
  const r = Math.round(risePer12 * 100) / 100;
  return `${r}/12`;
}

/** A force already in presented units (lbf or kN), as a magnitude with its unit. */
export function formatPresentedForce(value: number, unit: 'lbf' | 'kN'): string {
  const v = Math.abs(value);
  return unit === 'lbf' ? `${Math.round(v).toLocaleString('en-US')} lbf` : `${v.toFixed(2)} kN`;
}

/** A presented deflection (in or mm) with its unit: `0.412 in` or `10.5 mm`. */
export function formatPresentedDeflection(value: number, unit: 'in' | 'mm'): string {
  return unit === 'in' ? `${value.toFixed(3)} in` : `${value.toFixed(1)} mm`;
}
