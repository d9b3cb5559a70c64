/**
 * One plane beam-column element (Euler–Bernoulli, 3 degrees of freedom per end: u, v, θ) in its
 * local axes: x from the `from` end to the `to` end, y turned 90° counter-clockwise from x.
 * Local end forces q = [N₁, V₁, M₁, N₂, V₂, M₂] are the forces the joints exert on the member.
 * Stiffness and fixed-end forces: the standard matrices of the direct stiffness method (e.g.
 * Kassimali, Matrix Analysis of Structures, ch. 6–7); member releases by static condensation of
 * the released end rotation.
 */

/** Local stiffness (6×6, row-major) with releases condensed out, and the matching operator G. */
export interface ElementStiffness {
  k: Float64Array;
  /** q* = G·q₀ turns fixed-fixed end forces q₀ into those of the released member. */
  g: Float64Array;
}

/**
 * Local stiffness of a member with E, A, I, length L, condensed for the released ends. Written
 * into `into` at offset `at` when given (a frame keeps all its members in one array: a new
 * 36-number typed array per member costs more than computing it), else into new arrays.
 */
export function elementStiffness(
  e: number,
  a: number,
  i: number,
  length: number,
  releaseStart: boolean,
  releaseEnd: boolean,
  into?: ElementStiffness,
  at = 0,
): ElementStiffness {
  const L = length;
  const ea = (e * a) / L;
  const b12 = (12 * e * i) / L ** 3;
  const b6 = (6 * e * i) / L ** 2;
  const b4 = (4 * e * i) / L;
  const b2 = (2 * e * i) / L;
  const k = into?.k ?? new Float64Array(36);
  const g = into?.g ?? new Float64Array(36);
  // prettier-ignore
  k.set([
    ea, 0, 0, -ea, 0, 0,
    0, b12, b6, 0, -b12, b6,
    0, b6, b4, 0, -b6, b2,
    -ea, 0, 0, ea, 0, 0,
    0, -b12, -b6, 0, b12, -b6,
    0, b6, b2, 0, -b6, b4,
  ], at);
  g.fill(0, at, at + 36);
  for (let d = 0; d < 6; d++) g[at + d * 6 + d] = 1;
  if (releaseStart) condense(k, g, at, 2);
  if (releaseEnd) condense(k, g, at, 5);
  return { k, g };
}

/**
 * Eliminates local degree of freedom c (a released rotation, whose end moment is zero) by row
 * operations on [k | g]: afterwards k is the condensed stiffness (row and column c zero) and g
 * the operator that carries fixed-end forces over to the released member.
 */
function condense(k: Float64Array, g: Float64Array, at: number, c: number): void {
  const pivot = k[at + c * 6 + c];
  for (let r = 0; r < 6; r++) {
    if (r === c) continue;
    const f = k[at + r * 6 + c] / pivot;
    if (f === 0) continue;
    for (let col = 0; col < 6; col++) {
      k[at + r * 6 + col] -= f * k[at + c * 6 + col];
      g[at + r * 6 + col] -= f * g[at + c * 6 + col];
    }
  }
  for (let col = 0; col < 6; col++) {
    k[at + c * 6 + col] = 0;
    k[at + col * 6 + c] = 0;
    g[at + c * 6 + col] = 0;
  }
}

/** Adds the fixed-fixed end forces of a uniform load (px along, py across, N/mm) to q₀. */
export function addUniformFixedEnd(
  q0: Float64Array,
  at: number,
  L: number,
  px: number,
  py: number,
) {
  q0[at] -= (px * L) / 2;
  q0[at + 1] -= (py * L) / 2;
  q0[at + 2] -= (py * L * L) / 12;
  q0[at + 3] -= (px * L) / 2;
  q0[at + 4] -= (py * L) / 2;
  q0[at + 5] += (py * L * L) / 12;
}

/** Adds the fixed-fixed end forces of a point load (px, py, N) at distance a from the start. */
export function addPointFixedEnd(
  q0: Float64Array,
  at: number,
  L: number,
  a: number,
  px: number,
  py: number,
) {
  const b = L - a;
  q0[at] -= (px * b) / L;
  q0[at + 1] -= (py * b * b * (3 * a + b)) / L ** 3;
  q0[at + 2] -= (py * a * b * b) / (L * L);
  q0[at + 3] -= (px * a) / L;
  q0[at + 4] -= (py * a * a * (a + 3 * b)) / L ** 3;
  q0[at + 5] += (py * a * a * b) / (L * L);
}

/** Point loads across one member, local: position and transverse force. */
export interface LocalPoint {
  a: number;
  py: number;
}

/** M(x) of `alongMember` (module level, not a closure: it runs for every member of every solve). */
function momentAt(m0: number, v0: number, py: number, points: readonly LocalPoint[], x: number) {
  let m = m0 + v0 * x + (py * x * x) / 2;
  for (const p of points) if (x > p.a) m += p.py * (x - p.a);
  return m;
}

/**
 * Moment and shear along a member from its local end forces and loads. M(x) = −M₁ + V₁x +
 * py·x²/2 + Σ Pᵢ·(x − aᵢ)⁺ is the moment sagging + about local y; V(x) = dM/dx. Returns the
 * largest |M| strictly inside (at zero shear or under a point load), the largest |M| and |V|.
 */
export function alongMember(
  q: Float64Array,
  at: number,
  L: number,
  py: number,
  points: readonly LocalPoint[],
): { spanMoment: number; maxMoment: number; maxShear: number } {
  const m0 = -q[at + 2];
  const v0 = q[at + 1];
  let spanMoment = 0;
  let maxShear = 0;
  let start = 0;
  let shear = v0;
  const cuts = points.length > 1 ? [...points].sort((p, r) => p.a - r.a) : points;
  for (let s = 0; s <= cuts.length; s++) {
    const end = s < cuts.length ? cuts[s].a : L;
    const shearEnd = shear + py * (end - start);
    maxShear = Math.max(maxShear, Math.abs(shear), Math.abs(shearEnd));
    if (py !== 0) {
      const x = start - shear / py;
      if (x > start && x < end)
        spanMoment = Math.max(spanMoment, Math.abs(momentAt(m0, v0, py, points, x)));
    }
    if (s < cuts.length) {
      if (end > 0 && end < L)
        spanMoment = Math.max(spanMoment, Math.abs(momentAt(m0, v0, py, points, end)));
      shear = shearEnd + cuts[s].py;
      start = end;
    }
  }
  const ends = Math.max(Math.abs(m0), Math.abs(q[at + 5]));
  return { spanMoment, maxMoment: Math.max(spanMoment, ends), maxShear };
}
