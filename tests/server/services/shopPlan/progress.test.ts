import { describe, expect, it, vi } from 'vitest';
import { ShopPlan } from '../../../../server/models';
import { queueShopPlan } from '../../../../server/commands/shopPlans';
import { runShopPlan } from '../../../../server/services/shopPlan/job';
import { shopPlanStatusSchema, type ShopPlanProgress } from '../../../../shared/api/shopPlan';
import { testApp, testSequelize } from '../../../support/db';
import {
  FINK_24,
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';

vi.setConfig({ testTimeout: 120_000 });
const app = testApp();

/**
 * A realistic order (demo data): a 28 ft common Fink × 24, a 30 ft Howe × 12 and a 14 ft king
 * post × 8, a few hundred pieces over several lumbers.
 */
async function realisticOrder() {
  const plant = await createPlant();
  const order = await createOrder({
    job: await createJob({ customer: await createCustomer({ plant }) }),
  });
  const lines = [
    { mark: 'A1', quantity: 24, design: { ...FINK_24, span: 336, pitch: 6, overhang: 18 } },
    { mark: 'B1', quantity: 12, design: { ...FINK_24, profile: 'howe', span: 360, pitch: 5 } },
    { mark: 'K1', quantity: 8, design: { ...FINK_24, profile: 'kingPost', span: 168, pitch: 6 } },
  ];
  for (const l of lines) {
    const line = await createLine({
      order,
      mark: l.mark,
      design: l.design,
      reviewState: 'approved',
    });
    await line.update({ quantity: l.quantity });
  }
  const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
  return { order, foreman };
}

/** Every progress the job stores on the plan row, in order (what the pages poll). */
function recordProgress() {
  const stored: ShopPlanProgress[] = [];
  const hook = (row: ShopPlan) => {
    if (row.changed('runProgress') && row.runProgress) stored.push(row.runProgress);
  };
  ShopPlan.addHook('afterUpdate', 'progress-test', hook);
  return { stored, stop: () => ShopPlan.removeHook('afterUpdate', 'progress-test') };
}

describe('progress inside one solve', () => {
  it('stores column-generation rounds and integer-phase steps with the gap, and the page sees them', async () => {
    const { order, foreman } = await realisticOrder();
    await testSequelize().transaction((t) => queueShopPlan(t, order, null));
    const { stored, stop } = recordProgress();
    const polled: ShopPlanProgress[] = [];
    let running = true;
    const poll = (async () => {
      while (running) {
        const res = await foreman.get(`/api/shop/orders/${order.id}/lumber-plan`);
        const status = shopPlanStatusSchema.parse(res.body);
        if (status.run.progress) polled.push(status.run.progress);
      }
    })();
    try {
      await runShopPlan(order.id, { progressEveryMs: 0 });
    } finally {
      running = false;
      await poll;
      stop();
    }

    const inSolve = stored.filter((p) => p.stage === 'planning');
    const rounds = inSolve.filter((p) => p.solverStage === 'column-generation');
    const whole = inSolve.filter((p) => p.solverStage === 'integer-phase');
    expect(new Set(inSolve.map((p) => p.lumber)).size).toBeGreaterThan(1);
    // Several rounds of one lumber, each with the gap of the best plan so far to the bound.
    expect(rounds.length).toBeGreaterThan(inSolve.filter((p) => p.solverStage === 'done').length);
    for (const p of rounds) {
      expect(p.iterations).toBeGreaterThan(0);
      expect(p.gapPercent).toBeGreaterThanOrEqual(0);
    }
    // Integer-phase steps: pieces left go down within a lumber, never above its pieces.
    expect(whole.some((p) => p.steps > 0 && p.piecesLeft! < p.pieces)).toBe(true);
    for (const p of whole) expect(p.piecesLeft).toBeLessThanOrEqual(p.pieces);
    // The page polled while the job ran, and saw progress of a solve.
    expect(polled.some((p) => p.stage === 'planning')).toBe(true);

    const done = await ShopPlan.findOne({ where: { orderId: order.id } });
    expect(done!.runState).toBe('idle');
    expect(done!.lumberPlan!.sections.every((s) => s.plan !== null)).toBe(true);
  });

  it('throttled by default: between each lumber’s start and end, at most one store per 250 ms', async () => {
    const { order } = await realisticOrder();
    await testSequelize().transaction((t) => queueShopPlan(t, order, null));
    const { stored, stop } = recordProgress();
    const began = performance.now();
    try {
      await runShopPlan(order.id);
    } finally {
      stop();
    }
    const elapsed = performance.now() - began;
    const inSolve = stored.filter(
      (p) => p.stage === 'planning' && p.solverStage !== 'starting' && p.solverStage !== 'done',
    );
    expect(inSolve.length).toBeLessThanOrEqual(Math.ceil(elapsed / 250) + 1);
    const ends = stored.filter((p) => p.stage === 'planning' && p.solverStage === 'done');
    expect(ends.length).toBe(
      (await ShopPlan.findOne({ where: { orderId: order.id } }))!.lumberPlan!.sections.length,
    );
  });
});
