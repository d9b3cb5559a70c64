/**
 * An order's lumber plan: per lumber, the cut list's pieces (from `lumberDemand`) cut from the
 * plant's stock (its settings, else the invented demo stock) by the cutting-stock engine,
 * presented in inches and feet for the shop. Each lumber is planned separately; the shop-plan job
 * (`shopPlan/job.ts`) runs it and stores the result.
 */
import type { LumberPlanBody, LumberPlanSection } from '../../shared/api/lumberPlan';
import { stockFor as stockEntryFor, type StockSettings } from '../../shared/api/stock';
import {
  planCuttingSteps,
  type CuttingInput,
  type CuttingOptions,
  type CuttingProgress,
} from '../../shared/engine/cutting';
import { DESIGN_CAUTIONS } from '../../shared/engine/design';
import { isEngineError } from '../../shared/engine/errors';
import { nominalBoardFeetPerFoot } from '../../shared/engine/lumber/cost';
import { MM_PER_INCH } from '../../shared/engine/units';
import { ENGINE_VERSION } from '../../shared/engine/version';
import type { CutList } from '../../shared/engine/pieces';
import type { Order } from '../models';
import { lumberDemand, type PieceDemandRow } from './lumberDemand';
import { loadLpSolver } from './lp';

const MM_PER_FOOT = 12 * MM_PER_INCH;
const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** Board feet of lumber `lumberId` over `lengthFt` feet (0 for a size the table does not know). */
function boardFeet(lumberId: string, lengthFt: number) {
  try {
    return nominalBoardFeetPerFoot(lumberId) * lengthFt;
  } catch {
    return 0;
  }
}

type Board = Omit<NonNullable<LumberPlanSection['plan']>['boards'][number], 'count'>;

/** Boards cut alike (same stock, same marks and lengths) become one row with a count. */
function groupBoards(boards: Board[]) {
  const groups = new Map<string, Board & { count: number }>();
  for (const b of boards) {
    const key = `${b.lengthFt}|${b.pieces.map((p) => `${p.mark}:${p.lengthIn}`).join(',')}`;
    const g = groups.get(key);
    if (g) g.count += 1;
    else groups.set(key, { ...b, count: 1 });
  }
  return [...groups.values()];
}

/**
 * Where a plan is: which lumber (n of N), and inside its solve the solver's stage, rounds, steps
 * and gap to the lower bound (`starting` before the solve).
 */
export type PlanProgress = { lumber: string; section: number; sections: number } & (
  CuttingProgress | (Omit<CuttingProgress, 'stage'> & { stage: 'starting' })
);

type StepListener = (p: CuttingProgress) => Promise<void> | void;

/** Drives the solver's steps, awaiting the listener between them (it may store progress). */
async function solve(input: CuttingInput, options: CuttingOptions, onStep?: StepListener) {
  const steps = planCuttingSteps(input, options);
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    await onStep?.(next.value);
  }
}

async function planSection(
  lumber: string,
  rows: PieceDemandRow[],
  settings: StockSettings,
  onStep?: StepListener,
): Promise<LumberPlanSection> {
  const pieceCount = rows.reduce((n, r) => n + r.quantity, 0);
  const entry = stockEntryFor(settings, lumber);
  const base = { lumber, stockFrom: entry?.lumber ?? null, pieceCount };
  if (!entry) {
    return {
      ...base,
      plan: null,
      error: { code: 'no_stock', message: `No stock lengths are set for ${lumber}.` },
    };
  }
  const stocks = [...entry.stocks].sort((a, b) => a.lengthFt - b.lengthFt);
  try {
    const plan = await solve(
      {
        stocks: stocks.map((s) => ({
          length: s.lengthFt * MM_PER_FOOT,
          cost: s.price,
          ...(s.onHand !== null && { available: s.onHand }),
        })),
        kerf: settings.kerfIn * MM_PER_INCH,
        trim: settings.trimIn * MM_PER_INCH,
        pieces: rows.map((r) => ({ length: r.lengthMm, quantity: r.quantity, id: r.mark })),
      },
      { lp: await loadLpSolver(), timeLimitMs: 500 },
      onStep,
    );
    const feet = (boards: { stock: number }[]) =>
      boards.reduce((s, b) => s + boardFeet(lumber, b.stock / MM_PER_FOOT), 0);
    const ffd = plan.firstFitDecreasing;
    return {
      ...base,
      error: null,
      plan: {
        boardCount: plan.boardCount,
        totalCost: round(plan.totalCost, 2),
        wastePercent: round(plan.wastePercent, 2),
        boardFeet: round(feet(plan.boards), 1),
        lowerBound: round(plan.lowerBound.cost, 2),
        gapPercent: round(plan.gapPercent, 2),
        optimal: plan.optimal,
        firstFitDecreasing: ffd && {
          boardCount: ffd.boardCount,
          totalCost: round(ffd.totalCost, 2),
          wastePercent: round(ffd.wastePercent, 2),
        },
        byStock: stocks
          .map((s, i) => ({
            lengthFt: s.lengthFt,
            price: s.price,
            count: plan.boards.filter((b) => b.stockIndex === i).length,
          }))
          .filter((s) => s.count > 0)
          .reverse(),
        boards: groupBoards(
          plan.boards.map((b) => ({
            lengthFt: round(b.stock / MM_PER_FOOT, 3),
            pieces: b.pieces.map((p) => ({
              mark: p.id ?? '',
              lengthIn: round(p.length / MM_PER_INCH, 4),
            })),
            offcutIn: round(b.offcut / MM_PER_INCH, 3),
          })),
        ),
      },
    };
  } catch (e) {
    if (!isEngineError(e)) throw e;
    return { ...base, plan: null, error: { code: e.code, message: e.message } };
  }
}

/** Progress of a lumber whose solve has not begun. */
const NOT_STARTED = {
  iterations: 0,
  steps: 0,
  piecesLeft: null,
  lowerBound: 0,
  bestCost: null,
  gapPercent: null,
};

/**
 * The lumber plan of an order whose lines are all approved, from its cut list. `onProgress` hears
 * of each lumber before it is planned and of every step of its solve (rounds, dive steps, gap to
 * the bound); the plan waits for it, so a caller may store progress inside a solve.
 */
export async function lumberPlanFor(
  order: Pick<Order, 'id' | 'number'>,
  cutList: CutList,
  stock: { settings: StockSettings; demo: boolean },
  onProgress?: (p: PlanProgress) => Promise<void> | void,
): Promise<LumberPlanBody> {
  const sections: LumberPlanSection[] = [];
  const demand = [...lumberDemand(cutList)];
  for (const [i, [lumber, rows]] of demand.entries()) {
    const at = { lumber, section: i + 1, sections: demand.length };
    const pieces = rows.reduce((n, r) => n + r.quantity, 0);
    await onProgress?.({ ...at, ...NOT_STARTED, pieces, stage: 'starting' });
    sections.push(
      await planSection(lumber, rows, stock.settings, (p) => onProgress?.({ ...at, ...p })),
    );
  }
  const planned = sections.flatMap((s) => (s.plan ? [s.plan] : []));
  const sum = (f: (p: NonNullable<LumberPlanSection['plan']>) => number) =>
    planned.reduce((total, p) => total + f(p), 0);
  const bound = sum((p) => p.lowerBound);
  const cost = sum((p) => p.totalCost);
  const ffdKnown = planned.every((p) => p.firstFitDecreasing !== null);
  return {
    orderId: order.id,
    orderNumber: order.number,
    engineVersion: ENGINE_VERSION,
    demoStock: stock.demo,
    kerfIn: stock.settings.kerfIn,
    trimIn: stock.settings.trimIn,
    sections,
    totals: {
      boardCount: sum((p) => p.boardCount),
      totalCost: round(cost, 2),
      lowerBound: round(bound, 2),
      gapPercent: bound > 0 ? round(((cost - bound) / bound) * 100, 2) : 0,
      firstFitDecreasingCost: ffdKnown
        ? round(
            sum((p) => p.firstFitDecreasing!.totalCost),
            2,
          )
        : null,
    },
    cautions: [...DESIGN_CAUTIONS],
  };
}
