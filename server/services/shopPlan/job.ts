/**
 * The shop-plan job: cut list and lumber plan of one order, computed from its approved designs
 * and the plant's stock and stored with the engine version and the hashes of what they were made
 * from. Progress (cutting, then each lumber and, inside its solve, the column-generation rounds,
 * the integer phase's steps and the gap to the lower bound) is written to the plan row, throttled,
 * so the shop pages can show it while it runs.
 */
import { setImmediate as yieldToServer } from 'node:timers/promises';
import { Op } from 'sequelize';
import type { ShopPlanProgress } from '../../../shared/api/shopPlan';
import { isEngineError } from '../../../shared/engine/errors';
import { ENGINE_VERSION } from '../../../shared/engine/version';
import { stockFor } from '../../commands/stockSettings';
import { AppError } from '../../errors';
import { logger } from '../../logger';
import { Order, OrderLine, ShopPlan } from '../../models';
import { orderAttributes, orderIncludes } from '../../routes/orders/queries';
import { presentShopOrder } from '../../routes/shop/queries';
import { computeCutList, orderCutList } from '../cutList';
import { lumberPlanFor, type PlanProgress } from '../lumberPlan';
import { designsHash, stockHash } from './inputs';

const start: ShopPlanProgress = {
  stage: 'cutting',
  lumber: null,
  section: 0,
  sections: 0,
  solverStage: null,
  iterations: 0,
  totalIterations: 0,
  steps: 0,
  pieces: 0,
  piecesLeft: null,
  gapPercent: null,
};

/** How often progress inside a solve is stored (the page asks every second). */
const PROGRESS_EVERY_MS = 250;

/** Take the order's waiting (or interrupted) run; null when there is none to run. */
async function claim(orderId: number) {
  const [count, rows] = await ShopPlan.update(
    { runState: 'running', runProgress: start, runError: null },
    {
      where: { orderId, runState: { [Op.in]: ['queued', 'running'] } },
      returning: true,
    },
  );
  return count > 0 ? rows[0] : null;
}

/** A failure the order's data causes (not approved, lumber too deep): said, not retried. */
const expected = (e: unknown) => e instanceof AppError || isEngineError(e);

/**
 * Run the order's queued shop plan (the job queue's worker calls this; tests may too, with
 * `progressEveryMs` 0 to store every step of the solve).
 */
export async function runShopPlan(
  orderId: number,
  { progressEveryMs = PROGRESS_EVERY_MS }: { progressEveryMs?: number } = {},
) {
  const row = await claim(orderId);
  if (!row) return;
  const progress = async (p: Partial<ShopPlanProgress>) => {
    await row.update({ runProgress: { ...(row.runProgress ?? start), ...p } });
    await yieldToServer(); // the solver is synchronous: let the server answer between its steps
  };
  let stored = 0;
  /** Each lumber's start and end are stored; the steps between at most every `progressEveryMs`. */
  const due = (p: PlanProgress) => {
    const t = performance.now();
    if (p.stage !== 'starting' && p.stage !== 'done' && t - stored < progressEveryMs) return false;
    stored = t;
    return true;
  };
  try {
    const order = await Order.findByPk(orderId, {
      attributes: orderAttributes,
      include: orderIncludes,
    });
    const lines = await OrderLine.findAll({
      where: { orderId },
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    if (!order || lines.length === 0 || lines.some((l) => l.reviewState !== 'approved')) {
      throw new AppError(409, 'not_ready', 'Not every design of this order is approved.');
    }
    const stock = await stockFor(order.plantId);
    const hashes = { designsHash: designsHash(lines), stockHash: stockHash(stock) };
    const list = orderCutList(lines);
    const cutList = computeCutList(presentShopOrder(order), lines, list);
    let total = 0;
    const lumberPlan = await lumberPlanFor(order, list, stock, (p) => {
      if (p.stage === 'done') total += p.iterations;
      if (!due(p)) return;
      return progress({
        stage: 'planning',
        lumber: p.lumber,
        section: p.section,
        sections: p.sections,
        solverStage: p.stage,
        iterations: p.iterations,
        totalIterations: total,
        steps: p.steps,
        pieces: p.pieces,
        piecesLeft: p.piecesLeft,
        gapPercent: p.gapPercent === null ? null : Number(p.gapPercent.toFixed(2)),
      });
    });
    await progress({ stage: 'storing' });
    await row.update({
      cutList,
      lumberPlan,
      engineVersion: ENGINE_VERSION,
      ...hashes,
      madeAt: new Date(),
      runState: 'idle',
      runProgress: null,
      runError: null,
      jobId: null,
    });
  } catch (e) {
    await row.update({
      runState: 'failed',
      runError: e instanceof Error ? e.message : String(e),
      jobId: null,
    });
    // Failed is final for this request; the page offers Re-plan. Faults of the program are logged.
    if (!expected(e)) logger.error({ err: e, orderId }, 'shop plan failed');
  }
}
