import { afterAll, describe, expect, it } from 'vitest';
import { AuditEvent, ShopPlan } from '../../../../server/models';
import { shopPlanStatusSchema } from '../../../../shared/api/shopPlan';
import { testApp, testMailer } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';

// With a mailer the test app runs its own pg-boss queue, and the shop planner on it.
const app = testApp({}, undefined, await testMailer());
afterAll(async () => {
  await (app.locals.close as () => Promise<void>)();
});

describe('shop plans through the job queue', () => {
  it('approving an order’s last design queues its plan; the worker makes and stores it', async () => {
    const plant = await createPlant();
    const job = await createJob({ customer: await createCustomer({ plant }) });
    const order = await createOrder({ job });
    await createLine({ order, reviewState: 'approved', quantity: 2 });
    const last = await createLine({ order, quantity: 3 });
    const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
    const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const url = `/api/shop/orders/${order.id}/lumber-plan`;

    await engineer
      .post(`/api/orders/${order.id}/lines/${last.id}/review`, {
        decision: 'approve',
        designVersion: last.designVersion,
      })
      .expect(200);
    // Queued in the approval's own transaction.
    const row = await ShopPlan.findOne({ where: { orderId: order.id } });
    expect(row).not.toBeNull();

    const states = new Set<string>();
    await expect
      .poll(
        async () => {
          const s = shopPlanStatusSchema.parse((await foreman.get(url).expect(200)).body);
          states.add(s.run.state);
          return s.plan !== null && s.run.state === 'idle';
        },
        { timeout: 60_000, interval: 200 },
      )
      .toBe(true);
    const done = shopPlanStatusSchema.parse((await foreman.get(url).expect(200)).body);
    expect(done.outOfDate).toEqual([]);
    expect(done.plan!.sections.reduce((n, s) => n + s.pieceCount, 0)).toBeGreaterThan(0);
    const stored = (await ShopPlan.findOne({ where: { orderId: order.id } }))!;
    expect(stored.engineVersion).toBe(done.plan!.engineVersion);
    expect(stored.cutList!.quantity).toBe(
      done.plan!.sections.reduce((n, s) => n + s.pieceCount, 0),
    );
    expect(stored.jobId).toBeNull();

    // Re-plan through the queue too, and it is in the order's history.
    await foreman.post(`${url}/replan`).expect(202);
    await expect
      .poll(
        async () =>
          (await ShopPlan.findOne({ where: { orderId: order.id } }))!.madeAt!.getTime() >
          stored.madeAt!.getTime(),
        { timeout: 60_000, interval: 200 },
      )
      .toBe(true);
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'shop_plan.requested' } }),
    ).toBe(1);
  });
});
