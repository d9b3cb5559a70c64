import type { Instance } from './instance';
import { boundedKnapsack } from './knapsack';
import { gridKnapsacks } from './knapsackGrid';
import { patternKey, type Pattern } from './patterns';
import { drain } from './steps';
import type { LpSession, LpSolver } from './types';

/** The LP optimum of a (residual) master problem. */
export interface MasterSolution {
  /** LP objective without the artificial columns' penalty. */
  objective: number;
  /** Patterns with positive value in the LP optimum. */
  used: { pattern: Pattern; value: number }[];
  /** True when demand could be met only with artificial (impossible) boards: not enough stock. */
  infeasible: boolean;
  /** True when every pricing problem was solved to proven optimality (the bound is valid). */
  exact: boolean;
  /**
   * A proven lower bound on the LP optimum (Farley's bound, the best of all rounds; equal to
   * `objective` once no pattern prices out).
   */
  bound: number;
}

/** Options of one column-generation run. */
export interface MasterOptions {
  maxRounds?: number;
  /** Stop once the Lagrangian bound is within this fraction of the master's value. */
  relativeGap?: number;
}

/** One finished round of column generation: the master's value and the lower bound so far. */
export interface MasterRound {
  /** 0, 1, 2, … */
  round: number;
  objective: number;
  /** Farley's bound so far (0 before the first finite one, or while the master is infeasible). */
  bound: number;
}

/**
 * Gilmore–Gomory column generation for min Σ cⱼxⱼ s.t. Σ aᵢⱼxⱼ ≥ dᵢ (demand), Σ_{j of stock s}
 * xⱼ ≤ availableₛ, x ≥ 0, kept in one persistent LP so that every re-solve starts from the last
 * basis. Each round reads the duals πᵢ of the demand rows and μₛ ≤ 0 of the availability rows
 * and prices a new pattern per stock length by a bounded knapsack (values πᵢ, lengths + kerf,
 * bounds the residual demand); a pattern enters when cₛ − Σπᵢaᵢ − μₛ < 0. One artificial
 * column per piece length at a prohibitive cost keeps every master feasible; an artificial left
 * in the optimum means the stock on hand cannot cover the demand. The residual dive changes only
 * the row bounds (what is still to cut, boards still on hand), so the columns stay valid.
 */
export class Master {
  /** Every pattern generated, in LP column order after the artificials. */
  readonly patterns: Pattern[] = [];
  private readonly keys = new Set<string>();
  private readonly session: LpSession;
  private readonly limitRow: Map<number, number>;
  private readonly limited: number[];
  private readonly n: number;
  private demand: number[];
  private available: number[];
  private readonly tol: number;

  constructor(
    private readonly inst: Instance,
    lp: LpSolver,
  ) {
    this.n = inst.demand.length;
    this.demand = inst.demand.slice();
    this.available = inst.available.slice();
    this.limited = inst.available
      .map((a, s) => (Number.isFinite(a) ? s : -1))
      .filter((s) => s >= 0);
    this.limitRow = new Map(this.limited.map((s, k) => [s, this.n + k]));
    this.tol = 1e-9 * Math.max(1, ...inst.cost);
    const bigM = 1e4 * Math.max(1, ...inst.cost);
    this.session = lp.open({
      cost: this.demand.map(() => bigM),
      columns: this.demand.map((_, i) => ({ rows: [i], values: [1] })),
      rowLower: [...this.demand, ...this.limited.map(() => -Infinity)],
      rowUpper: [
        ...this.demand.map(() => Infinity),
        ...this.limited.map((s) => this.available[s]!),
      ],
    });
  }

  /** Adds patterns not yet in the LP; returns how many were new. */
  add(patterns: readonly Pattern[]): number {
    const fresh = patterns.filter((p) => {
      const key = patternKey(p);
      if (p.items.length === 0 || this.keys.has(key)) return false;
      this.keys.add(key);
      return true;
    });
    this.session.addColumns(
      fresh.map((p) => this.inst.cost[p.stock]!),
      fresh.map((p) => {
        const row = this.limitRow.get(p.stock);
        return row === undefined
          ? { rows: p.items, values: p.counts }
          : { rows: [...p.items, row], values: [...p.counts, 1] };
      }),
    );
    this.patterns.push(...fresh);
    return fresh.length;
  }

  /** Sets what is still to cut and the boards still on hand. */
  setResidual(demand: readonly number[], available: readonly number[]) {
    this.demand = demand.slice();
    this.available = available.slice();
    const rows = [...demand.keys(), ...this.limited.map((s) => this.limitRow.get(s)!)];
    this.session.setRowBounds(
      rows,
      [...demand, ...this.limited.map(() => -Infinity)],
      [...demand.map(() => Infinity), ...this.limited.map((s) => available[s]!)],
    );
  }

  /**
   * Column generation to LP optimality, or until Farley's bound z_master / θ (θ the largest
   * ratio of a priced pattern's dual value to its cost) is within `relativeGap` of the master's
   * value: the long tail of rounds that barely move the LP is not worth its time.
   */
  solve(options: MasterOptions = {}): MasterSolution {
    return drain(this.rounds(options));
  }

  /** `solve` one round at a time: yields after each round that priced its patterns. */
  *rounds(options: MasterOptions = {}): Generator<MasterRound, MasterSolution> {
    const { maxRounds = 1000, relativeGap = 0 } = options;
    let exact = true;
    let bound = -Infinity;
    for (let round = 0; ; round++) {
      const result = this.session.solve();
      if (result.status !== 'optimal') throw new Error(`The master LP ended ${result.status}.`);
      const artificialUse = result.x.slice(0, this.n).reduce((a, b) => a + b, 0);
      const used = this.patterns
        .map((pattern, j) => ({ pattern, value: result.x[this.n + j]! }))
        .filter((u) => u.value > 1e-9);
      const objective = used.reduce(
        (sum, u) => sum + this.inst.cost[u.pattern.stock]! * u.value,
        0,
      );
      const infeasible = artificialUse > 1e-6;
      const done = (proven: boolean) => ({
        objective,
        used,
        infeasible,
        exact: exact && proven,
        bound: proven ? objective : Math.max(bound, 0),
      });
      if (round >= maxRounds) return done(false);
      const pi = result.duals.slice(0, this.n).map((d) => Math.max(0, d));
      const mu = this.inst.capacity.map((_, s) => {
        const row = this.limitRow.get(s);
        return row === undefined ? 0 : Math.min(0, result.duals[row]!);
      });
      const priced: Pattern[] = [];
      // Farley's bound: (π, μ)/θ is dual feasible for θ = max over stocks of (Σπa + μ)/c, so
      // z_LP ≥ z_master/θ (every cost positive).
      let theta = 1;
      const grid = this.inst.grid;
      const tables = grid && gridKnapsacks(pi, grid.weights, this.demand, grid.capacity);
      this.inst.capacity.forEach((cap, s) => {
        if (this.available[s]! <= 0) return;
        const best =
          tables?.[s] ?? boundedKnapsack(pi, this.inst.weights, this.demand, cap, this.inst.eps);
        exact &&= best.exact;
        const cost = this.inst.cost[s]!;
        theta = Math.max(theta, cost > 0 ? (best.value + mu[s]!) / cost : Infinity);
        if (cost - best.value - mu[s]! < -this.tol) {
          priced.push({ stock: s, items: best.items, counts: best.counts });
        }
      });
      if (!infeasible && Number.isFinite(theta)) bound = Math.max(bound, objective / theta);
      yield { round, objective, bound: Math.max(bound, 0) };
      if (this.add(priced) === 0) return done(true);
      if (!infeasible && relativeGap > 0 && bound >= objective * (1 - relativeGap))
        return done(false);
    }
  }

  dispose() {
    this.session.dispose();
  }
}
