import { EngineError } from '../errors';
import { designValues, parseLumberId, sectionProperties } from '../lumber';

/** Shear in one member for one combination (N). */
export interface ShearCheckInput {
  lumberId: string;
  plies: number;
  /** Largest |V| along the member, N. */
  shear: number;
  /** Load duration factor of the combination. */
  cd: number;
}

/** fv = 1.5·V/A against Fv′ (MPa), and their ratio. */
export interface ShearCheckResult {
  fv: number;
  fvPrime: number;
  ratio: number;
}

/** Largest shear stress of a rectangular section, fv = 3V/(2A) (NDS 2018 §3.4.2), MPa. */
export const shearStress = (shear: number, area: number) => (1.5 * Math.abs(shear)) / area;

/**
 * Shear parallel to grain of a rectangular bending member, NDS 2018 §3.4.2: fv = 3V/(2bd) ≤ Fv′,
 * Fv′ = Fv·CD·CM·Ct·Ci (NDS 2018 Table 4.3.1: no size or repetitive factor). V is the largest
 * along the member, taken at the panel point: the NDS 2018 §3.4.3.1 allowance to neglect loads
 * within d of a support is not used (conservative).
 */
export function checkShear(input: ShearCheckInput): ShearCheckResult {
  const { lumberId, plies, shear, cd } = input;
  if (!Number.isInteger(plies) || plies < 1 || !Number.isFinite(shear)) {
    throw new EngineError('invalid', 'Shear check: plies must be ≥ 1 and the shear finite.', {
      plies,
      shear,
    });
  }
  const area = sectionProperties(parseLumberId(lumberId).size, plies).area;
  const fv = shearStress(shear, area);
  // Stryker disable next-line BooleanLiteral: Cr multiplies Fb only (NDS 2018 4.3.9), never Fv.
  const fvPrime = designValues(lumberId, { cd, repetitive: false }).fv;
  return { fv, fvPrime, ratio: fv / fvPrime };
}
