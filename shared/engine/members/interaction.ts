/**
 * NDS 2018 3.9.1, bending + axial tension: the larger of ft/Ft′ + fb/Fb* and (fb − ft)/Fb**.
 * Fb* excludes CL, Fb** includes it (sawn lumber has no CV); they are equal when CL = 1.
 */
export function tensionBendingIndex(
  ft: number,
  ftPrime: number,
  fb: number,
  fbStar: number,
  fbStarStar = fbStar,
): number {
  const tensionSide = ft / ftPrime + fb / fbStar;
  const compressionSide = (fb - ft) / fbStarStar;
  return Math.max(tensionSide, compressionSide);
}

/** Result of the NDS 3.9.2 uniaxial check. `buckles` is true when fc ≥ FcE1 (no valid index). */
export interface CompressionBendingResult {
  index: number;
  buckles: boolean;
}

/**
 * NDS 2018 3.9.2, bending about the strong axis + axial compression (uniaxial form):
 * (fc/Fc′)² + fb/[Fb′(1 − fc/FcE1)] ≤ 1, which also needs fc < FcE1 (FcE1 about the bending
 * axis). When fc ≥ FcE1 the amplifier is meaningless; the index becomes fc/FcE1 (≥ 1, a failure).
 */
export function compressionBendingIndex(
  fc: number,
  fcPrime: number,
  fb: number,
  fbPrime: number,
  fcE1: number,
): CompressionBendingResult {
  const r = fc / fcE1;
  if (r >= 1) return { index: Math.max(r, (fc / fcPrime) ** 2), buckles: true };
  return { index: (fc / fcPrime) ** 2 + fb / (fbPrime * (1 - r)), buckles: false };
}
