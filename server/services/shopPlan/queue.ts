/**
 * Shop plans through the job queue (the same pg-boss instance as mail). Commands mark an order's
 * plan row `queued` in their own transaction (the outbox); the relay sends each such row to the
 * queue as one job (right after the commit, and on a timer, so a crash in between loses nothing);
 * the worker runs `runShopPlan`, one order at a time per process.
 */
import { EventEmitter } from 'node:events';
import type PgBoss from 'pg-boss';
import { logger } from '../../logger';
import { ShopPlan } from '../../models';
import { serialRun } from '../serialRun';
import { runShopPlan } from './job';

export const SHOP_PLAN_QUEUE = 'shop-plan';

const requested = new EventEmitter();

/** Committed requests wake the relays of this process (others find them on their timer). */
export const wakeShopPlanner = () => void requested.emit('plan');

/** Send queued plan rows without a job to the queue (the order id is the job's key). */
async function relay(boss: PgBoss) {
  const waiting = await ShopPlan.findAll({
    where: { runState: 'queued', jobId: null },
    order: [['requestedAt', 'ASC']],
    limit: 50,
  });
  for (const row of waiting) {
    const jobId = await boss.send(SHOP_PLAN_QUEUE, { orderId: row.orderId });
    await ShopPlan.update(
      { jobId: jobId ?? 'duplicate' },
      { where: { id: row.id, runState: 'queued', jobId: null } },
    );
  }
}

export interface ShopPlanner {
  relay: () => Promise<void>;
  stop: () => Promise<void>;
}

/** Start the shop-plan worker and relay on a started pg-boss (`pollingIntervalSeconds` short in tests). */
export async function startShopPlanner(
  boss: PgBoss,
  opts: { pollingIntervalSeconds?: number } = {},
): Promise<ShopPlanner> {
  const polling = opts.pollingIntervalSeconds ?? 2;
  if (!(await boss.getQueue(SHOP_PLAN_QUEUE)))
    await boss.createQueue(SHOP_PLAN_QUEUE, { name: SHOP_PLAN_QUEUE, retryLimit: 2 });
  await boss.work<{ orderId: number }>(
    SHOP_PLAN_QUEUE,
    { pollingIntervalSeconds: polling },
    async ([job]) => runShopPlan(job.data.orderId),
  );
  const { run, idle } = serialRun(
    () => relay(boss),
    (err) => logger.warn({ err }, 'shop plan relay'),
  );
  const wake = () => void run();
  requested.on('plan', wake);
  await run();
  const timer = setInterval(wake, polling * 1000 * 5);
  timer.unref();
  return {
    relay: run,
    stop: async () => {
      clearInterval(timer);
      requested.off('plan', wake);
      await idle();
      await boss.offWork(SHOP_PLAN_QUEUE).catch(() => undefined);
    },
  };
}
