import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import { luSolve } from './dense';
import type { TrussGeometry } from './geometry';
import type { PreparedTruss } from './prepare';
import { prepareTruss } from './prepare';
import { memberForcesFromDisplacements, solveDisplacements } from './stiffness';
import type { AnalysisResult, JointLoad, TrussModel } from './types';
import { loadIssues, throwIfIssues } from './validate';

/** Largest accepted equilibrium residual, relative to max(1, largest joint load). */
export const RESIDUAL_LIMIT = 1e3 * TOLERANCE;

/** Sums the loads into `p` (2j) and returns the largest resultant load at any joint. */
function gatherLoads(g: TrussGeometry, loads: readonly JointLoad[], p: Float64Array): number {
  p.fill(0);
  for (const load of loads) {
    const j = g.jointIndex.get(load.joint)!;
    p[2 * j] += load.fx ?? 0;
    p[2 * j + 1] += load.fy ?? 0;
  }
  let largest = 0;
  for (let j = 0; j < p.length; j += 2) largest = Math.max(largest, Math.hypot(p[j], p[j + 1]));
  return largest;
}

/** ΣF at every joint (loads + member forces + reactions) into `f`, from the unknowns `x`. */
function jointForceSums(g: TrussGeometry, p: Float64Array, x: Float64Array, f: Float64Array) {
  f.set(p);
  const m = g.memberIds.length;
  for (let e = 0; e < m; e++) {
    const fx = x[e] * g.cos[e];
    const fy = x[e] * g.sin[e];
    f[2 * g.from[e]] += fx;
    f[2 * g.from[e] + 1] += fy;
    f[2 * g.to[e]] -= fx;
    f[2 * g.to[e] + 1] -= fy;
  }
  for (let r = 0; r < g.reactionDof.length; r++) f[g.reactionDof[r]] += x[m + r];
}

function maxJointResultant(f: Float64Array): number {
  let worst = 0;
  for (let j = 0; j < f.length; j += 2) worst = Math.max(worst, Math.hypot(f[j], f[j + 1]));
  return worst;
}

/**
 * Solves one load case on a prepared truss: member forces (tension +), reactions (the force each
 * support exerts on the truss) and, when every member has `ea`, joint displacements. Throws
 * EngineError `invalid` for a load on an unknown joint or a non-finite component, and `unstable`
 * if the solution fails the equilibrium check (never returns a wrong answer silently).
 */
export function solveLoads(prepared: PreparedTruss, loads: readonly JointLoad[]): AnalysisResult {
  const g = prepared.geometry;
  throwIfIssues(loadIssues(loads, g.jointIndex), 'loads');
  const { load: p, unknowns: x, displacement: u, jointForce: f } = prepared.scratch;
  const largestLoad = gatherLoads(g, loads, p);
  const m = g.memberIds.length;
  if (prepared.stiffness) solveDisplacements(prepared.stiffness, p, u);
  if (prepared.lu) {
    // A·x = −P
    for (let d = 0; d < p.length; d++) f[d] = -p[d];
    luSolve(prepared.lu, f, x);
  } else {
    memberForcesFromDisplacements(g, u, x);
    // Reactions take whatever the members and loads leave at each restrained dof.
    x.fill(0, m);
    jointForceSums(g, p, x, f);
    for (let r = 0; r < g.reactionDof.length; r++) x[m + r] = -f[g.reactionDof[r]];
  }
  jointForceSums(g, p, x, f);
  const residual = maxJointResultant(f) / Math.max(1, largestLoad);
  if (!(residual <= RESIDUAL_LIMIT)) {
    throw new EngineError(
      'unstable',
      `The equilibrium check failed (residual ${residual.toExponential(2)}): the truss is too ` +
        'close to a mechanism to analyse reliably.',
      { residual },
    );
  }
  return {
    classification: prepared.classification,
    redundants: prepared.redundants,
    members: g.memberIds.map((id, e) => ({ id, force: x[e] })),
    reactions: g.supports.map((s) => ({
      joint: s.joint,
      rx: s.rx >= 0 ? x[s.rx] : 0,
      ry: s.ry >= 0 ? x[s.ry] : 0,
    })),
    ...(prepared.stiffness && {
      displacements: g.jointIds.map((joint, j) => ({ joint, ux: u[2 * j], uy: u[2 * j + 1] })),
    }),
    residual,
  };
}

/** Validates, prepares and solves the model's own loads (`model.loads`, none if absent). */
export function analyzeTruss(model: TrussModel): AnalysisResult {
  return solveLoads(prepareTruss(model), model.loads ?? []);
}
