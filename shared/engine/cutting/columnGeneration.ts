import type { Instance } from './instance';
import { boundedKnapsack } from './knapsack';
import { capPattern, patternKey, type Pattern } from './patterns';
import type { LpSolver } from './types';

/** The generated columns, shared by every LP of one solve (the bound, each dive step, the MIP). */
export class ColumnPool {
  readonly patterns: Pattern[] = [];
  private readonly keys = new Set<string>();

  /** Adds a pattern unless it is already there; true when it was new. */
  add(p: Pattern): boolean {
    const key = patternKey(p);
    if (this.keys.has(key) || p.items.length === 0) return false;
    this.keys.add(key);
    this.patterns.push(p);
    return true;
  }
}

/** The LP optimum of a (residual) master problem over the pool. */
export interface MasterSolution {
  /** LP objective without the artificial columns' penalty. */
  objective: number;
  /** Pool patterns (capped at the residual demand) with positive value in the LP optimum. */
  used: { pattern: Pattern; value: number }[];
  /** True when demand could be met only with artificial (impossible) boards: not enough stock. */
  infeasible: boolean;
  /** True when every pricing problem was solved to proven optimality (the bound is valid). */
  exact: boolean;
}

/**
 * Gilmore–Gomory column generation for min Σ cⱼxⱼ s.t. Σ aᵢⱼxⱼ ≥ dᵢ (demand), Σ_{j of stock s}
 * xⱼ ≤ availableₛ, x ≥ 0. Each round solves the restricted master LP, reads the duals πᵢ of the
 * demand rows and μₛ ≤ 0 of the availability rows, and prices a new pattern per stock length by
 * a bounded knapsack (values πᵢ, lengths + kerf, bounds the residual demand); a pattern enters
 * when cₛ − Σπᵢaᵢ − μₛ < 0. One artificial column per piece length at a prohibitive cost keeps
 * every master feasible; an artificial left in the optimum means the stock on hand cannot cover
 * the demand.
 */
export function solveMaster(
  inst: Instance,
  lp: LpSolver,
  pool: ColumnPool,
  demand: readonly number[],
  available: readonly number[],
  maxRounds = 400,
): MasterSolution {
  const n = demand.length;
  const limited = available.map((a, s) => (Number.isFinite(a) ? s : -1)).filter((s) => s >= 0);
  const limitRow = new Map(limited.map((s, k) => [s, n + k]));
  const bigM = 1e4 * Math.max(1, ...inst.cost);
  const tol = 1e-9 * Math.max(1, ...inst.cost);
  let exact = true;
  for (let round = 0; ; round++) {
    const columns = pool.patterns
      .filter((p) => available[p.stock]! > 0)
      .map((p) => capPattern(p, demand))
      .filter((p) => p.items.length > 0);
    const rowsOf = (p: Pattern) => {
      const row = limitRow.get(p.stock);
      return {
        rows: row === undefined ? p.items : [...p.items, row],
        values: row === undefined ? p.counts : [...p.counts, 1],
      };
    };
    const artificial = demand.map((_, i) => ({ rows: [i], values: [1] }));
    const result = lp.solve({
      cost: [...columns.map((p) => inst.cost[p.stock]!), ...artificial.map(() => bigM)],
      columns: [...columns.map(rowsOf), ...artificial],
      rowLower: [...demand, ...limited.map(() => -Infinity)],
      rowUpper: [...demand.map(() => Infinity), ...limited.map((s) => available[s]!)],
    });
    if (result.status !== 'optimal') throw new Error(`The master LP ended ${result.status}.`);
    const artificialUse = result.x.slice(columns.length).reduce((a, b) => a + b, 0);
    const used = columns
      .map((pattern, j) => ({ pattern, value: result.x[j]! }))
      .filter((u) => u.value > 1e-9);
    const objective = used.reduce((sum, u) => sum + inst.cost[u.pattern.stock]! * u.value, 0);
    if (round >= maxRounds)
      return { objective, used, infeasible: artificialUse > 1e-6, exact: false };
    const pi = result.duals.slice(0, n).map((d) => Math.max(0, d));
    let added = false;
    inst.capacity.forEach((cap, s) => {
      if (available[s]! <= 0) return;
      const mu = limitRow.has(s) ? Math.min(0, result.duals[limitRow.get(s)!]!) : 0;
      const best = boundedKnapsack(pi, inst.weights, demand, cap, inst.eps);
      exact &&= best.exact;
      if (inst.cost[s]! - best.value - mu < -tol) {
        added = pool.add({ stock: s, items: best.items, counts: best.counts }) || added;
      }
    });
    if (!added) return { objective, used, infeasible: artificialUse > 1e-6, exact };
  }
}
