import { parseLumberId } from './ids';
import type { LumberGrade } from './referenceValues';
import { dressedSize } from './sizes';

/**
 * Board feet per linear foot from the nominal size (2 × w / 12), e.g. 2x4 → 0.667. Lumber is
 * priced by the board foot (common practice), so this ranks sizes when the plant has no prices.
 */
export function nominalBoardFeetPerFoot(lumberId: string): number {
  const { size } = parseLumberId(lumberId);
  return (2 * dressedSize(size).nominalWidth) / 12;
}

/**
 * Relative grade premium over the plainest stock. Common practice ordering only (higher grades
 * and MSR cost more); not market data — a plant's own price list replaces it.
 */
export const GRADE_PREMIUM: Record<LumberGrade, number> = {
  'SPF-1/2': 1.0,
  'HF-2': 1.0,
  'SP-2': 1.0,
  'DFL-2': 1.05,
  'HF-1': 1.05,
  'SP-1': 1.1,
  'DFL-1': 1.15,
  'MSR-1650-1.5E': 1.2,
  'MSR-2100-1.8E': 1.35,
};

/** Relative cost per linear foot (board feet × grade premium) for deciding the cheapest id. */
export function relativeCostPerFoot(lumberId: string): number {
  const { grade } = parseLumberId(lumberId);
  return nominalBoardFeetPerFoot(lumberId) * GRADE_PREMIUM[grade];
}
