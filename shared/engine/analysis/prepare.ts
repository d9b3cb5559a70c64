import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import { luFactor, type LuFactors } from './dense';
import { equilibriumMatrix, trussGeometry, type TrussGeometry } from './geometry';
import { mechanismModes, unstableError } from './mechanism';
import { stiffnessSystem, type StiffnessSystem } from './stiffness';
import type { Classification, TrussModel } from './types';
import { validateModel } from './validate';

/**
 * A truss made ready for many load cases: geometry, the equilibrium matrix and its factors (LU
 * when determinate), the factorised stiffness matrix when every member has `ea`, and scratch
 * buffers so a solve allocates only its result. Treat it as opaque; one prepared truss serves
 * one solve at a time.
 */
export interface PreparedTruss {
  readonly geometry: TrussGeometry;
  readonly classification: Classification;
  /** m + r − 2j. */
  readonly redundants: number;
  /** Equilibrium matrix A (2j × (m + r), row-major) with A·x + P = 0. */
  readonly equilibrium: Float64Array;
  /** LU of A, present when the truss is determinate. */
  readonly lu?: LuFactors;
  /** Present when every member has `ea`. */
  readonly stiffness?: StiffnessSystem;
  /** Scratch: joint loads (2j), unknowns (m + r), displacements (2j), joint force sums (2j). */
  readonly scratch: {
    readonly load: Float64Array;
    readonly unknowns: Float64Array;
    readonly displacement: Float64Array;
    readonly jointForce: Float64Array;
  };
}

/** Throws `unstable` when the equilibrium matrix has a mechanism; returns otherwise. */
function rejectMechanism(g: TrussGeometry, a: Float64Array): void {
  const report = mechanismModes(g, a);
  if (report.modes > 0) throw unstableError(g, report);
}

function factoriseStiffness(g: TrussGeometry, a: Float64Array): StiffnessSystem {
  const stiffness = stiffnessSystem(g);
  if (stiffness.factors.minPivotRatio <= TOLERANCE) {
    rejectMechanism(g, a);
    // Stable by the SVD but not positive definite in floating point: still refuse to guess.
    if (stiffness.factors.minPivotRatio <= 0) throw unstableError(g, { modes: 0, joints: [] });
  }
  return stiffness;
}

/**
 * Validates a model and prepares it for `solveLoads`. Throws EngineError `invalid` for a bad
 * model, `unstable` for a mechanism (naming the joints that can move, `details.joints`) and
 * `indeterminate` when m + r > 2j and some member lacks `ea` (`details.members`).
 */
export function prepareTruss(model: TrussModel): PreparedTruss {
  validateModel(model);
  const g = trussGeometry(model);
  const a = equilibriumMatrix(g);
  const equations = 2 * g.jointIds.length;
  const unknowns = g.memberIds.length + g.reactionDof.length;
  const redundants = unknowns - equations;
  const scratch = {
    load: new Float64Array(equations),
    unknowns: new Float64Array(unknowns),
    displacement: new Float64Array(equations),
    jointForce: new Float64Array(equations),
  };
  if (redundants < 0) throw unstableError(g, mechanismModes(g, a));
  if (redundants === 0) {
    // Columns of A have entries ≤ 1, so a pivot this small means a (near) mechanism.
    const lu = luFactor(a.slice(), equations);
    if (lu.minPivot <= TOLERANCE) rejectMechanism(g, a);
    const stiffness = g.allHaveEa ? factoriseStiffness(g, a) : undefined;
    const base = { geometry: g, redundants, equilibrium: a, lu, scratch };
    return { ...base, classification: 'determinate', stiffness };
  }
  if (!g.allHaveEa) {
    rejectMechanism(g, a);
    const missing = g.memberIds.filter((_, k) => Number.isNaN(g.ea[k]));
    throw new EngineError(
      'indeterminate',
      `The truss is statically indeterminate (${redundants} redundant); solving it needs the ` +
        `axial stiffness ea of every member, missing for: ${missing.join(', ')}.`,
      { members: missing, redundants },
    );
  }
  const stiffness = factoriseStiffness(g, a);
  return {
    geometry: g,
    classification: 'indeterminate',
    redundants,
    equilibrium: a,
    stiffness,
    scratch,
  };
}
