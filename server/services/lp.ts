/**
 * The LP/MIP solver the cutting-stock engine is handed: HiGHS compiled to WebAssembly (the
 * `highs` package). Loading the WASM is asynchronous and happens once per process; solving is
 * synchronous. Each solve builds a fresh model and disposes it, so nothing leaks between calls.
 */
import loadHighs, { type Highs } from 'highs';
import type { LpProblem, LpSolution, LpSolver } from '../../shared/engine/cutting';

let loading: Promise<Highs> | null = null;

/** HiGHS model status codes (`highs.constants.modelStatus`). */
const OPTIMAL = 7;
const INFEASIBLE = 8;
const LIMITS = new Set([11, 12, 13, 14, 16, 17]);

function solveWith(highs: Highs, p: LpProblem): LpSolution {
  const numCols = p.cost.length;
  const numRows = p.rowLower.length;
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  for (const c of p.columns) {
    indices.push(...c.rows);
    values.push(...c.values);
    starts.push(indices.length);
  }
  const clamp = (v: number) =>
    v === Infinity ? highs.infinity : v === -Infinity ? -highs.infinity : v;
  const model = highs.createModel({
    numCols,
    numRows,
    colCost: p.cost,
    colLower: p.cost.map(() => 0),
    colUpper: p.upper ? p.upper.map(clamp) : p.cost.map(() => highs.infinity),
    rowLower: p.rowLower.map(clamp),
    rowUpper: p.rowUpper.map(clamp),
    matrix: { format: 'csc', numRows, numCols, starts, indices, values },
    ...(p.integer && { integrality: p.cost.map(() => highs.constants.variableType.integer) }),
  });
  try {
    model.options.set({ output_flag: false });
    if (p.timeLimit !== undefined) model.options.set({ time_limit: Math.max(0.01, p.timeLimit) });
    if (p.integer && p.start) model.setSolution({ colValue: p.start });
    const { modelStatus } = model.run();
    const status: LpSolution['status'] =
      modelStatus === OPTIMAL
        ? 'optimal'
        : modelStatus === INFEASIBLE
          ? 'infeasible'
          : LIMITS.has(modelStatus)
            ? 'limit'
            : 'error';
    if (status === 'infeasible' || status === 'error')
      return { status, objective: NaN, x: [], duals: [] };
    const solution = model.getSolution();
    return {
      status,
      objective: model.getObjectiveValue(),
      x: Array.from(solution.colValue),
      duals: p.integer ? [] : Array.from(solution.rowDual),
    };
  } finally {
    model.dispose();
  }
}

/** Loads HiGHS (once) and returns the engine's LP solver backed by it. */
export async function loadLpSolver(): Promise<LpSolver> {
  loading ??= loadHighs();
  const highs = await loading;
  return { solve: (p) => solveWith(highs, p) };
}
