import { EngineError } from '../errors';

/** Load durations of NDS 2018 Table 2.3.2. */
export type LoadDuration =
  'permanent' | 'tenYears' | 'twoMonths' | 'sevenDays' | 'tenMinutes' | 'impact';

/**
 * Load duration factor CD, NDS 2018 Table 2.3.2 (engineering.md §1, V): dead 0.9, occupancy live
 * 1.0, snow 1.15, construction / roof live 1.25, wind or earthquake 1.6, impact 2.0.
 * CD does not apply to E, Emin or Fc⊥.
 */
export const LOAD_DURATION_FACTOR: Record<LoadDuration, number> = {
  permanent: 0.9,
  tenYears: 1.0,
  twoMonths: 1.15,
  sevenDays: 1.25,
  tenMinutes: 1.6,
  impact: 2.0,
};

/** Repetitive member factor Cr on Fb (NDS 2018 4.3.9; engineering.md §1, V). */
export const REPETITIVE_MEMBER_FACTOR = 1.15;

/** Largest spacing at which Cr applies: 24 in. o.c. (NDS 2018 4.3.9), in mm. */
export const REPETITIVE_MAX_SPACING_MM = 24 * 25.4;

/**
 * Cr applies to 2–4 in. thick members at ≤ 24 in. o.c. joined by a load-distributing element.
 * Half a millimetre of slack so 24 in. entered as 610 mm (rounded) still counts.
 */
export const repetitiveApplies = (spacingMm: number) =>
  spacingMm <= REPETITIVE_MAX_SPACING_MM + 0.5;

/** Size factors for one nominal width. */
export interface SizeFactors {
  fb: number;
  ft: number;
  fc: number;
}

// NDS 2018 Supplement Table 4A adjustment factors, grades SS / No.1 / No.2 / No.3, 2 & 3 in.
// thick (engineering.md §1 "Size factor CF", V). Nominal width → factors.
const TABLE_4A_CF: Record<number, SizeFactors> = {
  2: { fb: 1.5, ft: 1.5, fc: 1.15 },
  3: { fb: 1.5, ft: 1.5, fc: 1.15 },
  4: { fb: 1.5, ft: 1.5, fc: 1.15 },
  5: { fb: 1.4, ft: 1.4, fc: 1.1 },
  6: { fb: 1.3, ft: 1.3, fc: 1.1 },
  8: { fb: 1.2, ft: 1.2, fc: 1.05 },
  10: { fb: 1.1, ft: 1.1, fc: 1.0 },
  12: { fb: 1.0, ft: 1.0, fc: 1.0 },
};

const NO_SIZE_FACTOR: SizeFactors = { fb: 1, ft: 1, fc: 1 };

/**
 * Size factor CF for a nominal width. `table4A`: NDS 2018 Supplement Table 4A factors.
 * `none`: Southern Pine Table 4B values are size-specific (CF = 1.0 for 2x4–2x12) and MSR
 * (Table 4C) takes CF = 1.0 up to 12 in.
 */
export function sizeFactors(rule: 'table4A' | 'none', nominalWidth: number): SizeFactors {
  if (rule === 'none') return NO_SIZE_FACTOR;
  const f = TABLE_4A_CF[nominalWidth];
  if (!f) {
    throw new EngineError('invalid', `No size factor for a nominal width of ${nominalWidth} in.`, {
      nominalWidth,
    });
  }
  return f;
}

/**
 * Bearing area factor Cb, NDS 2018 3.10.4: (lb + 0.375 in.)/lb for bearings shorter than 6 in.
 * and at least 3 in. from the member's end; otherwise 1.0. Lengths in mm.
 */
export function bearingAreaFactor(bearingLength: number, distanceFromEnd: number): number {
  if (!(bearingLength > 0)) {
    throw new EngineError('invalid', 'Bearing length must be positive.', { bearingLength });
  }
  const sixIn = 6 * 25.4;
  const threeIn = 3 * 25.4;
  if (bearingLength >= sixIn || distanceFromEnd < threeIn) return 1;
  return (bearingLength + 0.375 * 25.4) / bearingLength;
}
