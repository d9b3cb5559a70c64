import { GRADE_DATA, isLumberGrade } from '../../../shared/engine/lumber/referenceValues';
import { dressedSize, isLumberSize } from '../../../shared/engine/lumber/sizes';
import type { PresentedDesign } from '../../../shared/engine/design';

/**
 * Specific gravity G of each species group, NDS 2018 Table 12.3.3A (oven-dry weight and volume;
 * from memory). MSR grades are the SPF stock the engine assumes for them.
 */
const SPECIFIC_GRAVITY: Record<string, number> = {
  'Spruce-Pine-Fir': 0.42,
  'Spruce-Pine-Fir (MSR)': 0.42,
  'Douglas Fir-Larch': 0.5,
  'Hem-Fir': 0.43,
  'Southern Pine': 0.55,
};

/** Water, lb/ft³ (common practice). */
const WATER_PCF = 62.4;
/** Dry (S-DRY) lumber is surfaced at 19 % moisture content or less (common practice); weighed at the top. */
const MOISTURE = 0.19;
const IN3_PER_FT3 = 1728;
const KG_PER_LB = 0.45359237;

/** How the tag weight is estimated, printed beside it. */
export const WEIGHT_BASIS =
  'Estimated lumber weight: dressed volume × G × 62.4 lb/ft³ × (1 + 0.19), with the species ' +
  'group’s specific gravity G (NDS 2018 Table 12.3.3A) at the 19 % moisture ceiling of dry ' +
  'lumber, shrinkage ignored (an upper estimate for handling); plates not included.';

/** lb/ft³ of a lumber id's species at 19 % moisture (null for an unknown id). */
export function lumberDensityPcf(lumberId: string): number | null {
  const [, grade] = lumberId.trim().split(/\s+/);
  if (!grade || !isLumberGrade(grade)) return null;
  const g = SPECIFIC_GRAVITY[GRADE_DATA[grade].species];
  return g === undefined ? null : g * WATER_PCF * (1 + MOISTURE);
}

/** Estimated lumber weight of one truss (all plies), lb: Σ pieces b·d·L × density. */
export function trussWeightLb(design: PresentedDesign, plies: number): number {
  const inches = (v: number) => (design.units.length === 'mm' ? v / 25.4 : v);
  let lb = 0;
  for (const p of design.pieces) {
    const [size] = p.lumber.trim().split(/\s+/);
    const density = lumberDensityPcf(p.lumber);
    if (!size || !isLumberSize(size) || density === null) continue;
    const { thicknessIn, widthIn } = dressedSize(size);
    lb += ((thicknessIn * widthIn * inches(p.length.value)) / IN3_PER_FT3) * density;
  }
  return lb * plies;
}

/** A weight in the plant's units: whole lb or kg, with its text ("est. 112 lb"). */
export function weightIn(lb: number, units: 'imperial' | 'metric') {
  const value = units === 'metric' ? Math.round(lb * KG_PER_LB) : Math.round(lb);
  const unit = units === 'metric' ? ('kg' as const) : ('lb' as const);
  return { value, unit, text: `est. ${value.toLocaleString('en-US')} ${unit}` };
}
