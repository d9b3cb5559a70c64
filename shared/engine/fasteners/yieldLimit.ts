/**
 * Lateral design values of dowel-type fasteners (nails, bolts) by the yield limit equations of
 * NDS 2018 §12.3.1 (Table 12.3.1A, single shear), the equations the NDS fastener tables
 * (Table 12N for common nails, Table 12A for bolts) are computed from. The NDS states them in
 * inches, psi and lb, and its dowel bearing strengths are empirical in those units, so this module
 * works in them and converts only its result.
 */
import { EngineError } from '../errors';
import { N_PER_LBF, type Newton } from '../units';

/** Yield modes of a single-shear connection (NDS 2018 Table 12.3.1A). */
export type YieldMode = 'Im' | 'Is' | 'II' | 'IIIm' | 'IIIs' | 'IV';

/**
 * Dowel bearing strength Fe, psi (NDS 2018 Table 12.3.3 footnotes, from memory): for D < 1/4 in.
 * Fe = 16,600·G^1.84 at any angle to grain; for larger dowels Fe∥ = 11,200·G and
 * Fe⊥ = 6,100·G^1.45/√D, combined at an angle θ by the Hankinson formula (NDS Eq. 12.3-11).
 */
export function dowelBearingStrength(g: number, diameterIn: number, angleDeg: number): number {
  if (diameterIn < 0.25) return 16600 * g ** 1.84;
  const par = 11200 * g;
  const perp = (6100 * g ** 1.45) / Math.sqrt(diameterIn);
  const t = (angleDeg * Math.PI) / 180;
  return (par * perp) / (par * Math.sin(t) ** 2 + perp * Math.cos(t) ** 2);
}

/**
 * Reduction term Rd (NDS 2018 Table 12.3.1B, from memory): for D < 1/4 in. KD = 2.2 (D ≤ 0.17
 * in.) or 10D + 0.5, all modes; for 1/4–1 in. 4Kθ (Im, Is), 3.6Kθ (II), 3.2Kθ (III, IV) with
 * Kθ = 1 + 0.25·θ/90 and θ the largest angle between load and grain.
 */
export function reductionTerm(diameterIn: number, mode: YieldMode, angleDeg: number): number {
  if (diameterIn < 0.25) return diameterIn <= 0.17 ? 2.2 : 10 * diameterIn + 0.5;
  const k = 1 + 0.25 * (Math.min(90, Math.abs(angleDeg)) / 90);
  return mode === 'Im' || mode === 'Is' ? 4 * k : mode === 'II' ? 3.6 * k : 3.2 * k;
}

/** A single-shear connection of two wood members, inches and psi. */
export interface SingleShear {
  /** Dowel diameter D, in. */
  diameter: number;
  /** Dowel bending yield strength Fyb, psi. */
  fyb: number;
  /** Side member thickness ls and dowel bearing length in the main member lm, in. */
  ls: number;
  lm: number;
  /** Dowel bearing strengths of the side and main members, psi. */
  fes: number;
  fem: number;
  /** Largest angle between load and grain, degrees (bolts' Rd). */
  angle: number;
}

/**
 * Reference lateral design value Z of one fastener in single shear: the least of the six yield
 * mode equations (NDS 2018 Eqs. 12.3-1 to 12.3-6), lb, with the governing mode.
 */
export function singleShearZ(c: SingleShear): { z: number; mode: YieldMode } {
  const { diameter: d, fyb, ls, lm, fes, fem, angle } = c;
  if (![d, fyb, ls, lm, fes, fem].every((v) => Number.isFinite(v) && v > 0)) {
    throw new EngineError('invalid', 'Fastener: every dimension and strength must be above 0.', {
      ...c,
    });
  }
  const re = fem / fes;
  const rt = lm / ls;
  const k1 =
    (Math.sqrt(re + 2 * re ** 2 * (1 + rt + rt ** 2) + rt ** 2 * re ** 3) - re * (1 + rt)) /
    (1 + re);
  const k2 = -1 + Math.sqrt(2 * (1 + re) + (2 * fyb * (1 + 2 * re) * d ** 2) / (3 * fem * lm ** 2));
  const k3 =
    -1 + Math.sqrt((2 * (1 + re)) / re + (2 * fyb * (2 + re) * d ** 2) / (3 * fem * ls ** 2));
  const rd = (m: YieldMode) => reductionTerm(d, m, angle);
  const modes: [YieldMode, number][] = [
    ['Im', (d * lm * fem) / rd('Im')],
    ['Is', (d * ls * fes) / rd('Is')],
    ['II', (k1 * d * ls * fes) / rd('II')],
    ['IIIm', (k2 * d * lm * fem) / ((1 + 2 * re) * rd('IIIm'))],
    ['IIIs', (k3 * d * ls * fem) / ((2 + re) * rd('IIIs'))],
    ['IV', (d ** 2 / rd('IV')) * Math.sqrt((2 * fem * fyb) / (3 * (1 + re)))],
  ];
  let best = modes[0];
  for (const m of modes) if (m[1] < best[1]) best = m;
  return { z: best[1], mode: best[0] };
}

/** A dowel fastener for wood-to-wood ply connections. */
export interface PlyFastener {
  id: 'nail10d' | 'nail16d' | 'bolt12';
  kind: 'nail' | 'bolt';
  /** Trade name with its size, e.g. "10d common nails (0.148 × 3 in.)". */
  label: string;
  /** Diameter and length, in. */
  diameter: number;
  length: number;
  /** Bending yield strength Fyb, psi. */
  fyb: number;
  /** Which NDS 2018 table lists its reference values. */
  table: string;
}

/**
 * Fasteners for joining the plies of a girder. Nail sizes per ASTM F1667 (common wire nails);
 * Fyb from the NDS 2018 Table 12N footnote: 90,000 psi for 0.142 < D ≤ 0.177 in. (from memory);
 * bolts ASTM A307 with Fyb 45,000 psi (Table 12A footnote, from memory).
 */
export const PLY_FASTENERS: Record<PlyFastener['id'], PlyFastener> = {
  nail10d: {
    id: 'nail10d',
    kind: 'nail',
    label: '10d common nails (0.148 × 3 in.)',
    diameter: 0.148,
    length: 3,
    fyb: 90000,
    table: 'NDS 2018 Table 12N',
  },
  nail16d: {
    id: 'nail16d',
    kind: 'nail',
    label: '16d common nails (0.162 × 3-1/2 in.)',
    diameter: 0.162,
    length: 3.5,
    fyb: 90000,
    table: 'NDS 2018 Table 12N',
  },
  bolt12: {
    id: 'bolt12',
    kind: 'bolt',
    label: '1/2 in. through-bolts (A307) with washers',
    diameter: 0.5,
    length: 0,
    fyb: 45000,
    table: 'NDS 2018 Table 12A',
  },
};

/**
 * Z of one fastener joining two plies of thickness `plyIn` (in.) with specific gravity g, loaded
 * at `angle` to the grain of both: a nail's side member is the ply it is driven through and its
 * main-member bearing length the penetration (at most the next ply); a bolt bears its full
 * thickness in both. Returns lb and N.
 */
export function plyFastenerZ(
  f: PlyFastener,
  g: number,
  plyIn: number,
  angle: number,
): { zLb: number; z: Newton; mode: YieldMode } {
  const fe = dowelBearingStrength(g, f.diameter, angle);
  const lm = f.kind === 'nail' ? Math.min(f.length - plyIn, plyIn) : plyIn;
  if (f.kind === 'nail' && lm < 6 * f.diameter) {
    throw new EngineError(
      'invalid',
      `${f.label}: penetration ${lm.toFixed(2)} in. is under 6D (NDS 2018 §12.1.6).`,
      { fastener: f.id },
    );
  }
  const { z, mode } = singleShearZ({
    diameter: f.diameter,
    fyb: f.fyb,
    ls: plyIn,
    lm,
    fes: fe,
    fem: fe,
    angle,
  });
  return { zLb: z, z: (z * N_PER_LBF) as Newton, mode };
}
