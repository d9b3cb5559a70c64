import { EngineError } from '../errors';

/**
 * A straight beam continuous over rigid supports (no settlement, rotation free), each span
 * carrying a uniform load across its axis. Lengths mm, loads N/mm, moments N·mm.
 */
export interface ContinuousBeam {
  /** Span lengths between consecutive supports, mm (> 0). */
  spans: ArrayLike<number>;
  /** Uniform transverse load of each span, N/mm; + is the direction of gravity. */
  loads: ArrayLike<number>;
  /**
   * Moments applied at the two end supports, N·mm, hogging + (e.g. a cantilever beyond the end
   * support carrying gravity load); 0 for a pinned end or a hinge.
   */
  startMoment?: number;
  endMoment?: number;
}

/**
 * Support moments of a continuous beam by the three-moment equation (Clapeyron), hogging +,
 * one per support (spans + 1 values, the ends being the given end moments). For support i
 * between spans of lengths Lᵢ and Lᵢ₊₁ with uniform loads wᵢ and wᵢ₊₁:
 *   Mᵢ₋₁·Lᵢ + 2·Mᵢ·(Lᵢ + Lᵢ₊₁) + Mᵢ₊₁·Lᵢ₊₁ = (wᵢ·Lᵢ³ + wᵢ₊₁·Lᵢ₊₁³) / 4.
 * EI appears on both sides and cancels when it is constant along the beam (one piece of lumber),
 * so the support moments of a beam on rigid supports need no section. The tridiagonal system is
 * diagonally dominant and is solved directly (Thomas algorithm). Throws EngineError `invalid` on
 * a non-positive span or mismatched arrays.
 */
export function supportMoments(beam: ContinuousBeam): Float64Array {
  const { spans, loads } = beam;
  const n = spans.length;
  if (n === 0 || loads.length !== n) {
    throw new EngineError('invalid', 'A beam needs at least one span and one load per span.', {
      spans: n,
      loads: loads.length,
    });
  }
  for (let i = 0; i < n; i++) {
    if (!(spans[i] > 0) || !Number.isFinite(spans[i]) || !Number.isFinite(loads[i])) {
      throw new EngineError('invalid', 'Beam spans must be positive and loads finite.', {
        span: i,
        length: spans[i],
        load: loads[i],
      });
    }
  }
  const m = new Float64Array(n + 1);
  m[0] = beam.startMoment ?? 0;
  m[n] = beam.endMoment ?? 0;
  const inner = n - 1;
  if (inner === 0) return m;
  // Thomas algorithm over the interior supports 1 … n − 1: row j has sub-diagonal Lⱼ, diagonal
  // 2(Lⱼ + Lⱼ₊₁) and super-diagonal Lⱼ₊₁; the known end moments move to the right-hand side.
  const c = new Float64Array(inner);
  const d = new Float64Array(inner);
  for (let j = 0; j < inner; j++) {
    const left = spans[j];
    const right = spans[j + 1];
    let rhs = (loads[j] * left * left * left + loads[j + 1] * right * right * right) / 4;
    if (j === 0) rhs -= m[0] * left;
    if (j === inner - 1) rhs -= m[n] * right;
    const sub = j === 0 ? 0 : left;
    const pivot = 2 * (left + right) - (j === 0 ? 0 : sub * c[j - 1]);
    c[j] = right / pivot;
    d[j] = (rhs - (j === 0 ? 0 : sub * d[j - 1])) / pivot;
  }
  m[inner] = d[inner - 1];
  for (let j = inner - 2; j >= 0; j--) m[j + 1] = d[j] - c[j] * m[j + 2];
  return m;
}

/**
 * Sagging moment at the point of zero shear inside one span (uniform load w over length L, end
 * moments hogging + at its start and end), N·mm, signed (sagging +). Between the ends
 * M(x) = w·x·(L − x)/2 − Ma·(1 − x/L) − Mb·x/L, a parabola; its vertex is the only interior
 * extreme. Returns 0 when the vertex is not strictly inside the span (the ends then bound |M|).
 */
export function spanPeakMoment(
  length: number,
  w: number,
  startMoment: number,
  endMoment: number,
): number {
  if (w === 0) return 0;
  const x = length / 2 - (endMoment - startMoment) / (w * length);
  if (!(x > 0 && x < length)) return 0;
  return (w * x * (length - x)) / 2 - startMoment * (1 - x / length) - (endMoment * x) / length;
}
