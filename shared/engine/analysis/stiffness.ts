import { choleskyFactor, choleskySolve, type CholeskyFactors } from './dense';
import type { TrussGeometry } from './geometry';

/** The factorised stiffness matrix of the unrestrained degrees of freedom, with scratch space. */
export interface StiffnessSystem {
  /** Index of each global dof among the free ones, −1 where a support restrains it. */
  readonly freeIndex: Int32Array;
  readonly factors: CholeskyFactors;
  /** Scratch for one solve: free-dof loads, then free-dof displacements. */
  readonly work: Float64Array;
}

/**
 * Assembles K_ff = Σ (EA/L)·[e eᵀ, −e eᵀ; −e eᵀ, e eᵀ] over the free dofs and factorises it once
 * (Cholesky: K_ff is symmetric and positive definite exactly when the truss is stable).
 */
export function stiffnessSystem(g: TrussGeometry): StiffnessSystem {
  const dofs = 2 * g.jointIds.length;
  const freeIndex = new Int32Array(dofs).fill(0);
  for (const d of g.reactionDof) freeIndex[d] = -1;
  let nf = 0;
  for (let d = 0; d < dofs; d++) if (freeIndex[d] === 0) freeIndex[d] = nf++;
  const k = new Float64Array(nf * nf);
  for (let e = 0; e < g.memberIds.length; e++) {
    const s = g.ea[e] / g.length[e];
    const c = [g.cos[e], g.sin[e], -g.cos[e], -g.sin[e]];
    const at = [2 * g.from[e], 2 * g.from[e] + 1, 2 * g.to[e], 2 * g.to[e] + 1];
    for (let p = 0; p < 4; p++) {
      const fp = freeIndex[at[p]];
      if (fp < 0) continue;
      for (let q = 0; q < 4; q++) {
        const fq = freeIndex[at[q]];
        if (fq >= 0) k[fp * nf + fq] += s * c[p] * c[q];
      }
    }
  }
  return { freeIndex, factors: choleskyFactor(k, nf), work: new Float64Array(nf) };
}

/**
 * Joint displacements `u` (2j, restrained dofs 0) for the joint loads `p` (2j), reusing the
 * factorisation. Allocates nothing.
 */
export function solveDisplacements(s: StiffnessSystem, p: Float64Array, u: Float64Array): void {
  const { freeIndex, work } = s;
  for (let d = 0; d < freeIndex.length; d++) if (freeIndex[d] >= 0) work[freeIndex[d]] = p[d];
  choleskySolve(s.factors, work, work);
  for (let d = 0; d < freeIndex.length; d++) u[d] = freeIndex[d] >= 0 ? work[freeIndex[d]] : 0;
}

/** Axial force from displacements: N = EA/L · (u_to − u_from)·e, tension positive. */
export function memberForcesFromDisplacements(
  g: TrussGeometry,
  u: Float64Array,
  out: Float64Array,
) {
  for (let e = 0; e < g.memberIds.length; e++) {
    const i = g.from[e];
    const j = g.to[e];
    const stretch = (u[2 * j] - u[2 * i]) * g.cos[e] + (u[2 * j + 1] - u[2 * i + 1]) * g.sin[e];
    out[e] = (g.ea[e] / g.length[e]) * stretch;
  }
}
