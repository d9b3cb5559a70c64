import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import type { TrussGeometry } from './geometry';

/** Mechanism modes of a truss: how many independent ones, and which joints take part. */
export interface MechanismReport {
  modes: number;
  joints: string[];
}

/**
 * Finds the mechanisms from the left null space of the equilibrium matrix A (2j × n): vectors d
 * with Aᵀ·d = 0 are joint displacements that stretch no member and move no support. A joint
 * moves when its share of that space (the norm of its rows in an orthonormal basis, which does
 * not depend on the basis chosen) is not negligible.
 */
export function mechanismModes(g: TrussGeometry, a: Float64Array): MechanismReport {
  const rows = 2 * g.jointIds.length;
  const cols = a.length / rows;
  // Pad with zero columns so U is the full rows × rows basis even when n < 2j.
  const width = Math.max(rows, cols);
  const mat = new Matrix(rows, width);
  for (let i = 0; i < rows; i++) {
    for (let c = 0; c < cols; c++) mat.set(i, c, a[i * cols + c]);
  }
  const svd = new SingularValueDecomposition(mat, {
    computeLeftSingularVectors: true,
    computeRightSingularVectors: false,
    autoTranspose: true,
  });
  const sigma = svd.diagonal;
  const u = svd.leftSingularVectors;
  const largest = Math.max(...sigma, 0);
  const share = new Float64Array(g.jointIds.length);
  let modes = 0;
  for (let c = 0; c < rows; c++) {
    const s = c < sigma.length ? sigma[c] : 0;
    if (s > TOLERANCE * largest) continue;
    modes++;
    for (let i = 0; i < rows; i++) share[i >> 1] += u.get(i, c) ** 2;
  }
  // Basis vectors are unit length; rounding leaves ~1e-16 in joints that truly stay put.
  const joints = g.jointIds.filter((_, j) => Math.sqrt(share[j]) > Math.sqrt(TOLERANCE));
  return { modes, joints };
}

/** The EngineError `unstable` for a truss whose equilibrium matrix has the given mechanisms. */
export function unstableError(g: TrussGeometry, report: MechanismReport): EngineError {
  const equations = 2 * g.jointIds.length;
  const unknowns = g.memberIds.length + g.reactionDof.length;
  const shortBy = Math.max(0, equations - unknowns);
  const count =
    `${g.memberIds.length} members + ${g.reactionDof.length} reaction components = ${unknowns}` +
    ` unknowns for ${equations} equilibrium equations`;
  const plural = shortBy === 1 ? '' : 's';
  const need =
    shortBy > 0
      ? ` It needs at least ${shortBy} more member${plural} or support component${plural}.`
      : '';
  const who =
    report.joints.length > 0
      ? `joints ${report.joints.join(', ')} can move without stretching any member`
      : 'it can move without stretching any member';
  return new EngineError(
    'unstable',
    `The truss is unstable (a mechanism): ${who} (${count}).${need}`,
    { joints: report.joints, modes: report.modes, unknowns, equations, shortBy },
  );
}
