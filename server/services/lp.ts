/**
 * The LP/MIP solver the cutting-stock engine is handed: HiGHS compiled to WebAssembly (the
 * `highs` package). Loading the WASM is asynchronous and happens once per process; solving is
 * synchronous. A one-shot solve builds a fresh model and disposes it; a session keeps one model
 * so that column generation re-solves from the previous basis.
 */
import loadHighs, { type Highs, type Model } from 'highs';
import type { LpProblem, LpSession, LpSolution, LpSolver } from '../../shared/engine/cutting';

let loading: Promise<Highs> | null = null;

/** HiGHS model status codes (`highs.constants.modelStatus`). */
const OPTIMAL = 7;
const INFEASIBLE = 8;
const LIMITS = new Set([11, 12, 13, 14, 16, 17]);

/** Sparse columns as CSC arrays. */
function csc(columns: LpProblem['columns']) {
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  for (const c of columns) {
    indices.push(...c.rows);
    values.push(...c.values);
    starts.push(indices.length);
  }
  return { starts, indices, values };
}

function createModel(highs: Highs, p: LpProblem, integer: boolean): Model {
  const inf = (v: number) =>
    v === Infinity ? highs.infinity : v === -Infinity ? -highs.infinity : v;
  const numCols = p.cost.length;
  const numRows = p.rowLower.length;
  const model = highs.createModel({
    numCols,
    numRows,
    colCost: p.cost,
    colLower: p.cost.map(() => 0),
    colUpper: p.upper ? p.upper.map(inf) : p.cost.map(() => highs.infinity),
    rowLower: p.rowLower.map(inf),
    rowUpper: p.rowUpper.map(inf),
    matrix: { format: 'csc', numRows, numCols, ...csc(p.columns) },
    ...(integer && { integrality: p.cost.map(() => highs.constants.variableType.integer) }),
  });
  model.options.set({ output_flag: false });
  return model;
}

function run(model: Model, integer: boolean, timeLimit?: number): LpSolution {
  if (timeLimit !== undefined) model.options.set({ time_limit: Math.max(0.01, timeLimit) });
  const { modelStatus } = model.run();
  const status: LpSolution['status'] =
    modelStatus === OPTIMAL
      ? 'optimal'
      : modelStatus === INFEASIBLE
        ? 'infeasible'
        : LIMITS.has(modelStatus)
          ? 'limit'
          : 'error';
  if (status === 'infeasible' || status === 'error') {
    return { status, objective: NaN, x: [], duals: [] };
  }
  const solution = model.getSolution();
  return {
    status,
    objective: model.getObjectiveValue(),
    x: Array.from(solution.colValue),
    duals: integer ? [] : Array.from(solution.rowDual),
  };
}

function session(highs: Highs, p: LpProblem): LpSession {
  const model = createModel(highs, p, false);
  const inf = (v: number) =>
    v === Infinity ? highs.infinity : v === -Infinity ? -highs.infinity : v;
  return {
    addColumns(cost, columns) {
      if (cost.length === 0) return;
      const m = csc(columns);
      model.addCols({
        cost: Float64Array.from(cost),
        lower: new Float64Array(cost.length),
        upper: new Float64Array(cost.length).fill(highs.infinity),
        matrix: {
          format: 'csc',
          numRows: p.rowLower.length,
          numCols: cost.length,
          starts: Int32Array.from(m.starts),
          indices: Int32Array.from(m.indices),
          values: Float64Array.from(m.values),
        },
      });
    },
    setRowBounds(rows, lower, upper) {
      rows.forEach((r, k) => model.changeRowBounds(r, inf(lower[k]!), inf(upper[k]!)));
    },
    solve: () => run(model, false),
    dispose: () => model.dispose(),
  };
}

/** Loads HiGHS (once) and returns the engine's LP solver backed by it. */
export async function loadLpSolver(): Promise<LpSolver> {
  loading ??= loadHighs();
  const highs = await loading;
  return {
    solve(p) {
      const model = createModel(highs, p, p.integer === true);
      try {
        if (p.integer && p.start) model.setSolution({ colValue: p.start });
        return run(model, p.integer === true, p.timeLimit);
      } finally {
        model.dispose();
      }
    },
    open: (p) => session(highs, p),
  };
}
