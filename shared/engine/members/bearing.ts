import { EngineError } from '../errors';
import { bearingAreaFactor, designValues, dressedSize, parseLumberId } from '../lumber';

/** A reaction bearing on the narrow face of a chord (N, mm). */
export interface BearingInput {
  lumberId: string;
  plies: number;
  /** Reaction magnitude, N. */
  reaction: number;
  /** Bearing length along the member, mm. */
  bearingLength: number;
  /** Distance from the member's end to the bearing, mm (0 at a heel). */
  distanceFromEnd?: number;
}

/** Bearing perpendicular to grain: fc⊥ = R/(b·lb) against Fc⊥′ = Fc⊥·Cb (MPa). */
export interface BearingResult {
  ratio: number;
  stress: number;
  fcPerpPrime: number;
  cb: number;
}

/** Bearing check, NDS 2018 3.10.2 with the bearing area factor Cb of 3.10.4 (CD does not apply). */
export function checkBearing(input: BearingInput): BearingResult {
  const { lumberId, plies, reaction, bearingLength, distanceFromEnd = 0 } = input;
  if (!Number.isInteger(plies) || plies < 1 || !Number.isFinite(reaction)) {
    throw new EngineError('invalid', 'Bearing check: plies must be ≥ 1 and the reaction finite.', {
      plies,
      reaction,
    });
  }
  const { size } = parseLumberId(lumberId);
  const cb = bearingAreaFactor(bearingLength, distanceFromEnd);
  // Fc⊥ takes no CD (NDS 2018 Table 4.3.1), so any CD gives the same value here.
  // Stryker disable next-line BooleanLiteral: Cr multiplies Fb only (NDS 2018 4.3.9), never Fc⊥.
  const fcPerpPrime = designValues(lumberId, { cd: 1, repetitive: false }).fcPerp * cb;
  const stress = Math.abs(reaction) / (plies * dressedSize(size).thickness * bearingLength);
  return { ratio: stress / fcPerpPrime, stress, fcPerpPrime, cb };
}
