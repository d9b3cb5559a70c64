/** Largest bending slenderness ratio RB NDS 2018 §3.3.3.7 allows. */
export const MAX_BEAM_SLENDERNESS = 50;

/**
 * Effective length le of a bending member from its laterally unbraced length lu (NDS 2018
 * Table 3.3.3, the row for a single span or cantilever under any load — the conservative row the
 * table's footnote gives when the load pattern is not listed; a truss chord is continuous with
 * loads at and between panel points, so no listed row applies; from memory):
 * le = 2.06·lu (lu/d < 7), 1.63·lu + 3d (7 ≤ lu/d ≤ 14.3), 1.84·lu (lu/d > 14.3). Same units as lu.
 */
export function bendingEffectiveLength(lu: number, d: number): number {
  if (!(lu > 0)) return 0;
  const ratio = lu / d;
  if (ratio < 7) return 2.06 * lu;
  if (ratio <= 14.3) return 1.63 * lu + 3 * d;
  return 1.84 * lu;
}

/** Beam stability of one member: RB, FbE and CL (NDS 2018 §3.3.3). */
export interface BeamStability {
  /** Effective length, same unit as lu (0 = compression edge braced throughout). */
  le: number;
  /** RB = √(le·d/b²) (Eq. 3.3-5). */
  rb: number;
  /** FbE = 1.20·Emin′/RB² (stress unit of Emin′; infinite when braced). */
  fbE: number;
  /** CL (Eq. 3.3-6); 1 when braced. */
  cl: number;
}

/**
 * CL = (1 + FbE/Fb*)/1.9 − √[((1 + FbE/Fb*)/1.9)² − (FbE/Fb*)/0.95], FbE = 1.20·Emin′/RB²,
 * RB = √(le·d/b²) (NDS 2018 §3.3.3.6–3.3.3.8, Eq. 3.3-5/3.3-6, from memory). Fb* is Fb with every
 * factor but CL (and CV/Cfu, which sawn lumber does not take). `lu` is the distance between
 * points that hold the compression edge laterally; 0 means held throughout (§3.3.3.3: CL = 1).
 */
export function beamStability(input: {
  lu: number;
  d: number;
  b: number;
  fbStar: number;
  eminPrime: number;
}): BeamStability {
  const { lu, d, b, fbStar, eminPrime } = input;
  const le = bendingEffectiveLength(lu, d);
  if (le === 0) return { le: 0, rb: 0, fbE: Number.POSITIVE_INFINITY, cl: 1 };
  const rb = Math.sqrt((le * d) / (b * b));
  const fbE = (1.2 * eminPrime) / (rb * rb);
  const ratio = fbE / fbStar;
  const h = (1 + ratio) / 1.9;
  // The same root written without cancellation for stiff members (large FbE/Fb*).
  const cl = ratio / 0.95 / (h + Math.sqrt(h * h - ratio / 0.95));
  return { le, rb, fbE, cl };
}
