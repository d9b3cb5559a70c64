import { EngineError } from '../errors';
import { Master } from './columnGeneration';
import { buildInstance, pieceLength, type Instance } from './instance';
import { diveResidual, solvePoolMip } from './integerPhase';
import { firstFitDecreasing, planCost, tidyPlan, type Pattern } from './patterns';
import { drain, mapSteps } from './steps';
import type {
  CuttingInput,
  CuttingOptions,
  CuttingPlan,
  CuttingProgress,
  PlanFigures,
  PlannedBoard,
} from './types';

/**
 * The largest g such that every cost is a whole multiple of g (to 1/1000 of a unit), or 0 when
 * the costs have no common grid. Every plan then costs a multiple of g, so the LP bound rounds up
 * to the next multiple.
 */
export function costGrid(costs: readonly number[]): number {
  const scaled = costs.map((c) => c * 1000);
  if (scaled.some((c) => Math.abs(c - Math.round(c)) > 1e-6 * Math.max(1, c))) return 0;
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  return scaled.map(Math.round).reduce(gcd, 0) / 1000;
}

/** LP value rounded up to the cost grid (a tiny tolerance absorbs the LP's round-off). */
export function roundUpBound(lp: number, grid: number): number {
  if (grid <= 0) return lp;
  return grid * Math.ceil(lp / grid - 1e-7 * Math.max(1, lp / grid));
}

/**
 * Valid without an LP: every board of stock s gives capacity Cₛ for cost cₛ, so the pieces'
 * total length (+ kerf each) costs at least that length × the cheapest cost per capacity.
 */
const materialBound = (inst: Instance) =>
  inst.weights.reduce((sum, w, i) => sum + w * inst.demand[i]!, 0) *
  Math.min(...inst.cost.map((c, s) => c / inst.capacity[s]!));

function figures(inst: Instance, boards: readonly Pattern[]): PlanFigures {
  const stock = boards.reduce((sum, b) => sum + inst.stockLength[b.stock]!, 0);
  const pieces = boards.reduce((sum, b) => sum + pieceLength(inst, b.items, b.counts), 0);
  return {
    boardCount: boards.length,
    totalCost: planCost(inst, boards),
    wastePercent: stock > 0 ? ((stock - pieces) / stock) * 100 : 0,
  };
}

/** Boards as the saw sees them: pieces longest first with their ids, offcut, longest stock first. */
function presentBoards(inst: Instance, boards: readonly Pattern[]): PlannedBoard[] {
  const ids = inst.ids.map((list) => list.map((e) => ({ ...e })));
  const nextId = (i: number) => {
    const entry = ids[i]!.find((e) => e.quantity > 0);
    if (!entry) return undefined;
    entry.quantity -= 1;
    return entry.id;
  };
  const sorted = [...boards].sort(
    (a, b) =>
      inst.stockLength[b.stock]! - inst.stockLength[a.stock]! ||
      pieceLength(inst, b.items, b.counts) - pieceLength(inst, a.items, a.counts),
  );
  return sorted.map((b) => {
    const pieces: PlannedBoard['pieces'] = [];
    b.items.forEach((i, k) => {
      for (let c = 0; c < b.counts[k]!; c++) {
        const id = nextId(i);
        pieces.push(
          id === undefined ? { length: inst.lengths[i]! } : { length: inst.lengths[i]!, id },
        );
      }
    });
    const used = pieceLength(inst, b.items, b.counts) + (pieces.length - 1) * inst.kerf + inst.trim;
    return {
      stock: inst.stockLength[b.stock]!,
      stockIndex: b.stock,
      cost: inst.cost[b.stock]!,
      pieces,
      offcut: Math.max(0, inst.stockLength[b.stock]! - used),
    };
  });
}

/**
 * Plans which stock boards to pull and what to cut from each, at least cost.
 *
 * 1. Column generation (Gilmore–Gomory) solves the LP relaxation over all cutting patterns;
 *    its optimum, rounded up to the costs' common grid, is the lower bound no plan can beat.
 * 2. Integer phase: residual diving (fix the LP's whole boards, re-solve what is left), then,
 *    if the plan is still above the bound and time remains, the MIP over every pattern
 *    generated, started from the dive's plan.
 * 3. First-fit decreasing is the fallback (and the only method without an LP solver), and its
 *    figures are always reported so the saving is visible.
 *
 * `options.onProgress` hears of every step (see `planCuttingSteps`).
 *
 * @throws EngineError `piece_too_long` when a piece fits no stock; `not_enough_stock` when the
 *   boards on hand cannot hold the order; `invalid` for malformed input.
 */
export function planCutting(input: CuttingInput, options: CuttingOptions = {}): CuttingPlan {
  return drain(planCuttingSteps(input, options), options.onProgress);
}

/**
 * `planCutting` one step at a time: yields after every column-generation round (root LP and
 * dive), every dive step and around the whole-board search, with the lower bound so far, the
 * best whole plan so far and the gap between them; returns the plan. A caller that awaits
 * between steps (to store progress, or let a server answer) gets the same plan, except that the
 * integer phase's time budget is wall-clock time.
 */
export function* planCuttingSteps(
  input: CuttingInput,
  options: CuttingOptions = {},
): Generator<CuttingProgress, CuttingPlan> {
  const inst = buildInstance(input);
  const now = options.now ?? (() => performance.now());
  const ffdRaw = firstFitDecreasing(inst);
  const ffd = ffdRaw ? figures(inst, ffdRaw) : null;
  const material = materialBound(inst);
  const shortfall = () =>
    new EngineError(
      'not_enough_stock',
      'The boards on hand cannot hold every piece of this order: add stock or raise the counts on hand.',
    );

  let boards: Pattern[];
  let bound = material;
  let lpValue: number | null = null;
  let method: CuttingPlan['method'] = 'first-fit-decreasing';
  let rounds = 0;
  let steps = 0;
  let bestCost = ffd?.totalCost ?? null;
  const pieces = inst.demand.reduce((a, b) => a + b, 0);
  const at = (
    stage: CuttingProgress['stage'],
    lowerBound: number,
    piecesLeft: number | null = null,
  ): CuttingProgress => ({
    stage,
    iterations: rounds,
    steps,
    pieces,
    piecesLeft,
    lowerBound,
    bestCost,
    gapPercent:
      bestCost === null || lowerBound <= 0
        ? null
        : Math.max(0, ((bestCost - lowerBound) / lowerBound) * 100),
  });
  if (options.lp && inst.demand.length > 0) {
    const master = new Master(inst, options.lp);
    try {
      master.add(ffdRaw ?? []);
      const root = yield* mapSteps(
        master.rounds({ relativeGap: options.lpGap ?? 1e-5 }),
        (r): CuttingProgress => {
          rounds = r.round + 1;
          return at('column-generation', Math.max(material, r.bound));
        },
      );
      if (root.infeasible) throw shortfall();
      lpValue = root.bound;
      if (root.exact) bound = Math.max(material, roundUpBound(root.bound, costGrid(inst.cost)));
      yield at('integer-phase', bound, pieces);
      const tol = 1e-9 * Math.max(1, bound);
      const deadline = now() + (options.timeLimitMs ?? 1500);
      const dived = yield* mapSteps(diveResidual(inst, master, deadline, now), (d) => {
        steps = d.step;
        return at('integer-phase', bound, d.piecesLeft);
      });
      let best = [dived, ffdRaw]
        .filter((p): p is Pattern[] => p !== null)
        .map((p) => tidyPlan(inst, p))
        .sort((a, b) => planCost(inst, a) - planCost(inst, b))[0];
      const cost = (p: Pattern[] | undefined) => (p ? planCost(inst, p) : Infinity);
      bestCost = best ? cost(best) : null;
      // Without any plan yet (the stock on hand is tight) the MIP gets at least a second.
      const remaining = Math.max((deadline - now()) / 1000, best ? 0 : 1);
      if (cost(best) > bound + tol && remaining > 0.05) {
        steps += 1;
        yield at('integer-phase', bound, 0); // the whole-board search is one call: said before it
        const mip = solvePoolMip(inst, options.lp, master.patterns, best ?? [], remaining);
        if (mip) {
          const tidied = tidyPlan(inst, mip);
          if (planCost(inst, tidied) < cost(best)) best = tidied;
        }
      }
      if (!best) throw shortfall();
      boards = best;
    } finally {
      master.dispose();
    }
    method = 'column-generation';
  } else {
    if (!ffdRaw) throw shortfall();
    boards = ffdRaw;
  }
  const result = figures(inst, boards);
  bestCost = result.totalCost;
  yield at('done', bound, 0);
  const gap = bound > 0 ? ((result.totalCost - bound) / bound) * 100 : 0;
  return {
    boards: presentBoards(inst, boards),
    ...result,
    lowerBound: { cost: bound, lp: lpValue },
    optimal: result.totalCost <= bound + 1e-9 * Math.max(1, bound),
    gapPercent: Math.max(0, gap),
    firstFitDecreasing: ffd,
    method,
  };
}
