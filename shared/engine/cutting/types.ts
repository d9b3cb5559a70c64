/**
 * Contracts of the cutting-stock solver. Lengths are in any one consistent unit (the server
 * passes mm, the CLI whatever its file uses); costs in any currency. Nothing here is branded,
 * because the solver never mixes units: it only adds and compares lengths.
 */

/** One stock length the plant can pull from the rack. */
export interface StockLength {
  length: number;
  /** Price of one board of this length. */
  cost: number;
  /** Boards on hand; absent means as many as needed. */
  available?: number;
}

/** A piece to cut, `quantity` times. Pieces of equal length are interchangeable. */
export interface PieceDemand {
  length: number;
  quantity: number;
  /** Carried through to the plan (e.g. a piece mark); pieces of one length may have several ids. */
  id?: string;
}

/** A whole cutting-stock order. */
export interface CuttingInput {
  stocks: StockLength[];
  pieces: PieceDemand[];
  /** Saw kerf: one between neighbouring pieces on a board. Default 0. */
  kerf?: number;
  /** End trim taken off every board before cutting. Default 0. */
  trim?: number;
}

/**
 * A linear (or mixed-integer) programme handed to the injected solver:
 * minimise Σ cost·x subject to rowLower ≤ A·x ≤ rowUpper and 0 ≤ x ≤ upper.
 * Row bounds may be ±Infinity. Columns are sparse.
 */
export interface LpProblem {
  cost: number[];
  /** Upper bounds of the columns; absent means unbounded. */
  upper?: number[];
  columns: { rows: number[]; values: number[] }[];
  rowLower: number[];
  rowUpper: number[];
  /** Solve with every column integer (a MIP); duals are then meaningless. */
  integer?: boolean;
  /** A feasible integer start for a MIP (one value per column). */
  start?: number[];
  /** Wall-clock limit in seconds. */
  timeLimit?: number;
}

/** The solver's answer. `duals` are row duals (≥ 0 on a binding ≥ row of a minimisation). */
export interface LpSolution {
  status: 'optimal' | 'infeasible' | 'limit' | 'error';
  objective: number;
  x: number[];
  duals: number[];
}

/**
 * A persistent LP kept between solves: columns are added and row bounds changed, and each
 * solve starts from the previous basis (column generation re-solves hundreds of times).
 */
export interface LpSession {
  addColumns(cost: number[], columns: LpProblem['columns']): void;
  setRowBounds(rows: number[], lower: number[], upper: number[]): void;
  solve(): LpSolution;
  dispose(): void;
}

/**
 * An LP/MIP solver. The engine stays free of Node built-ins and WASM loading: the server, CLI
 * and tests inject one (see `server/services/lp.ts`, backed by HiGHS).
 */
export interface LpSolver {
  /** One-shot solve (the MIP over the pool). */
  solve(problem: LpProblem): LpSolution;
  /** Opens a persistent LP (continuous) starting from `problem`. */
  open(problem: LpProblem): LpSession;
}

/** Options of `planCutting`. */
export interface CuttingOptions {
  /** The LP/MIP solver; without one the plan is first-fit decreasing with a material bound. */
  lp?: LpSolver;
  /** Time budget of the integer phase in ms (default 1500); the LP bound is always finished. */
  timeLimitMs?: number;
  /**
   * Column generation stops once its Lagrangian bound is within this fraction of the LP's
   * value (default 1e-5); 0 solves the LP to optimality.
   */
  lpGap?: number;
  /** Clock in ms (default `performance.now`); injectable for tests. */
  now?: () => number;
  /** Told of every step: each column-generation round, dive step, the integer phase, done. */
  onProgress?: (progress: CuttingProgress) => void;
}

/** Where `planCutting` is inside one solve, with the gap between its best plan and its bound. */
export interface CuttingProgress {
  stage: 'column-generation' | 'integer-phase' | 'done';
  /** Rounds of the root LP's column generation so far. */
  iterations: number;
  /** Integer-phase steps so far (dive steps, then one for the whole-board search). */
  steps: number;
  /** Pieces of the order, and those the integer phase has still to place (null before it). */
  pieces: number;
  piecesLeft: number | null;
  /** The best lower bound on the cost so far (Farley's bound while the LP is being solved). */
  lowerBound: number;
  /** Cost of the best whole plan so far (first-fit decreasing's at first), null when none. */
  bestCost: number | null;
  /** How far `bestCost` is above `lowerBound`, in % (null when either is unknown). */
  gapPercent: number | null;
}

/** One board of the plan: which stock, which pieces (longest first), what is left over. */
export interface PlannedBoard {
  /** Stock length of the board. */
  stock: number;
  /** Index into the input's `stocks`. */
  stockIndex: number;
  cost: number;
  pieces: { length: number; id?: string }[];
  /** Length left after the pieces, the kerfs between them and the trim. */
  offcut: number;
}

/** Board count, cost and waste of a plan. */
export interface PlanFigures {
  boardCount: number;
  totalCost: number;
  /** (stock pulled − piece length) / stock pulled, in %: kerf, trim and offcuts. */
  wastePercent: number;
}

/** The solver's result. */
export interface CuttingPlan extends PlanFigures {
  boards: PlannedBoard[];
  lowerBound: {
    /** No plan can cost less than this. */
    cost: number;
    /** The LP relaxation's bound (before rounding up), or null without an LP solver. */
    lp: number | null;
  };
  /** True when the plan's cost equals the lower bound (proven least cost). */
  optimal: boolean;
  /** (totalCost − lowerBound) / lowerBound in %: the plan is at most this much above the least cost. */
  gapPercent: number;
  /** What first-fit decreasing alone would have used, for comparison; null when it ran out of stock. */
  firstFitDecreasing: PlanFigures | null;
  method: 'column-generation' | 'first-fit-decreasing';
}
