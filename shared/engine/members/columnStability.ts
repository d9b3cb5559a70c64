import { EngineError } from '../errors';

/** Largest le/d NDS 2018 3.7.1.4 allows for a compression member in service. */
export const MAX_SLENDERNESS = 50;

/** Column buckling coefficient c for sawn lumber (NDS 2018 3.7.1). */
export const SAWN_LUMBER_C = 0.8;

/**
 * Critical buckling design value FcE = 0.822·Emin′/(le/d)² (NDS 2018 3.7.1). Infinite for a
 * fully braced axis (le/d = 0). Units follow `eminPrime`.
 */
export function eulerBucklingStress(eminPrime: number, slenderness: number): number {
  if (slenderness <= 0) return Number.POSITIVE_INFINITY;
  return (0.822 * eminPrime) / slenderness ** 2;
}

/**
 * Column stability factor Cp (NDS 2018 Eq. 3.7-1):
 * Cp = (1+α)/(2c) − √[((1+α)/(2c))² − α/c], α = FcE/Fc*.
 * Evaluated as (α/c)/(A + √(A² − α/c)) — the same root — so stiff columns (large α) do not lose
 * digits to cancellation.
 */
export function columnStabilityFactor(fcStar: number, fcE: number, c = SAWN_LUMBER_C): number {
  if (!(fcStar > 0) || !(fcE > 0)) {
    throw new EngineError(
      'invalid',
      'Fc* and FcE must be positive for the column stability factor.',
      {
        fcStar,
        fcE,
      },
    );
  }
  if (!Number.isFinite(fcE)) return 1;
  const alpha = fcE / fcStar;
  const a = (1 + alpha) / (2 * c);
  return alpha / c / (a + Math.sqrt(a * a - alpha / c));
}

/** Inputs of a compression design value about both axes (consistent units). */
export interface ColumnInput {
  /** Fc* (all factors but Cp) and Emin′, same stress unit. */
  fcStar: number;
  eminPrime: number;
  /** Effective length about the strong axis, buckling across d; 0 = fully braced. */
  leStrong: number;
  d: number;
  /** Effective length about the weak axis, buckling across b; 0 = fully braced. */
  leWeak: number;
  b: number;
  c?: number;
}

/** Cp about each axis and the governing Fc′ = Fc*·min(Cp). */
export interface ColumnResult {
  slendernessStrong: number;
  slendernessWeak: number;
  fcEStrong: number;
  fcEWeak: number;
  cpStrong: number;
  cpWeak: number;
  cp: number;
  fcPrime: number;
  governingAxis: 'strong' | 'weak';
}

/** Compression design value Fc′ with each axis's own effective length (NDS 2018 3.7.1). */
export function columnDesignValue(input: ColumnInput): ColumnResult {
  const { fcStar, eminPrime, leStrong, d, leWeak, b, c = SAWN_LUMBER_C } = input;
  const slendernessStrong = leStrong / d;
  const slendernessWeak = leWeak / b;
  const fcEStrong = eulerBucklingStress(eminPrime, slendernessStrong);
  const fcEWeak = eulerBucklingStress(eminPrime, slendernessWeak);
  const cpStrong = columnStabilityFactor(fcStar, fcEStrong, c);
  const cpWeak = columnStabilityFactor(fcStar, fcEWeak, c);
  const cp = Math.min(cpStrong, cpWeak);
  return {
    slendernessStrong,
    slendernessWeak,
    fcEStrong,
    fcEWeak,
    cpStrong,
    cpWeak,
    cp,
    fcPrime: fcStar * cp,
    governingAxis: cpWeak < cpStrong ? 'weak' : 'strong',
  };
}
