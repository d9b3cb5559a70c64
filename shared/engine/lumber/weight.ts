import { dressedSize } from './sizes';
import { parseLumberId } from './ids';
import { GRADE_DATA } from './referenceValues';
import type { Mm } from '../units';

/**
 * Specific gravity G by species group, NDS 2018 Table 12.3.3A (oven-dry weight and volume).
 * MSR grades are assumed to be SPF stock, as their reference values are.
 */
const SPECIFIC_GRAVITY: Record<string, number> = {
  'Douglas Fir-Larch': 0.5,
  'Hem-Fir': 0.43,
  'Spruce-Pine-Fir': 0.42,
  'Southern Pine': 0.55,
};

/** Moisture allowance on the oven-dry density: lumber shipped at about 15 % MC (common practice). */
const MOISTURE_ALLOWANCE = 1.15;
/** Density of water, kg/m³. */
const WATER = 1000;

/** Specific gravity of a lumber id's species (SPF when the grade names no other species). */
export function specificGravity(lumberId: string): number {
  const { grade } = parseLumberId(lumberId);
  return SPECIFIC_GRAVITY[GRADE_DATA[grade].species] ?? SPECIFIC_GRAVITY['Spruce-Pine-Fir'];
}

/**
 * Estimated mass of a length of one lumber, kg: dressed section × length × G × water × 15 %
 * moisture. An estimate for tags, loading and comparisons, not a design value.
 */
export function lumberMassKg(lumberId: string, length: Mm): number {
  const { size } = parseLumberId(lumberId);
  const s = dressedSize(size);
  const volumeM3 = (s.thickness * s.width * length) / 1e9;
  return volumeM3 * specificGravity(lumberId) * WATER * MOISTURE_ALLOWANCE;
}
