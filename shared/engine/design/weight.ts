import { lumberMassKg } from '../lumber/weight';
import { mm, MM_PER_INCH } from '../units';
import type { PresentedDesign } from './present';

/**
 * Estimated lumber mass of one truss of a presented design (all plies), kg: the sum of its
 * pieces' `lumberMassKg`. The one rule behind the weights on tags, delivery tickets and the
 * profile comparison.
 */
export function trussLumberMassKg(design: PresentedDesign, plies: number): number {
  const toMm = (v: number) => (design.units.length === 'mm' ? v : v * MM_PER_INCH);
  const kg = design.pieces.reduce(
    (s, p) => s + lumberMassKg(p.lumber, mm(toMm(p.length.value))),
    0,
  );
  return kg * plies;
}
