import { dressedSize } from './sizes';
import { parseLumberId } from './ids';
import { GRADE_DATA } from './referenceValues';
import type { Mm } from '../units';

/**
 * Specific gravity G by species group, NDS 2018 Table 12.3.3A (oven-dry weight and volume;
 * from memory). MSR grades are assumed to be SPF stock, as their reference values are.
 */
const SPECIFIC_GRAVITY: Record<string, number> = {
  'Douglas Fir-Larch': 0.5,
  'Hem-Fir': 0.43,
  'Spruce-Pine-Fir': 0.42,
  'Southern Pine': 0.55,
};

/**
 * Moisture content of the estimate: 19 %, the most that dry lumber (grade stamp S-DRY or KD-19)
 * may hold when surfaced — American Softwood Lumber Standard DOC PS 20 and the grading rules
 * written under it; NDS 2018 Supplement reference values are for that dry service (MC ≤ 19 %)
 * (from memory). A truss plant builds and ships with such lumber; taking the ceiling gives an
 * upper estimate, the safe side for handling and loading.
 */
export const SHIPPING_MOISTURE_CONTENT = 0.19;
/** Density of water, kg/m³ (the reference of specific gravity). */
const WATER = 1000;

/** How the estimate is made, printed beside it (tags, delivery tickets, profile comparison). */
export const LUMBER_WEIGHT_BASIS =
  'Estimated lumber weight: dressed volume × G × water (62.4 lb/ft³, 1000 kg/m³) × (1 + 0.19), ' +
  'with the species group’s specific gravity G (NDS 2018 Table 12.3.3A) at the 19 % moisture ' +
  'ceiling of dry lumber, shrinkage ignored (an upper estimate for handling); plates not included.';

/** Specific gravity of a lumber id's species (SPF when the grade names no other species). */
export function specificGravity(lumberId: string): number {
  const { grade } = parseLumberId(lumberId);
  return SPECIFIC_GRAVITY[GRADE_DATA[grade].species] ?? SPECIFIC_GRAVITY['Spruce-Pine-Fir'];
}

/** Estimated density of a lumber id as shipped, kg/m³: G × water × (1 + 19 %). */
export function lumberDensityKgM3(lumberId: string): number {
  return specificGravity(lumberId) * WATER * (1 + SHIPPING_MOISTURE_CONTENT);
}

/**
 * Estimated mass of a length of one lumber, kg: dressed section × length × shipped density
 * (see LUMBER_WEIGHT_BASIS). An estimate for tags, loading and comparisons, not a design value.
 */
export function lumberMassKg(lumberId: string, length: Mm): number {
  const { size } = parseLumberId(lumberId);
  const s = dressedSize(size);
  const volumeM3 = (s.thickness * s.width * length) / 1e9;
  return volumeM3 * lumberDensityKgM3(lumberId);
}
