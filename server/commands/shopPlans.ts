import type { Transaction } from 'sequelize';
import { conflict } from '../errors';
import { Order, OrderLine, ShopPlan, type User } from '../models';
import { wakeShopPlanner } from '../services/shopPlan/queue';
import { audit } from './audit';

/**
 * Ask for a new shop plan of an order inside the caller's transaction (the caller holds the
 * order's row lock): the plan row marked `queued` is the outbox the planner's relay sends to the
 * job queue once this commits. A run already queued or running is left to finish.
 */
export async function queueShopPlan(
  t: Transaction,
  order: Pick<Order, 'id' | 'plantId'>,
  actorId: number | null,
) {
  const [row] = await ShopPlan.findOrCreate({
    where: { orderId: order.id },
    defaults: { orderId: order.id, plantId: order.plantId },
    transaction: t,
  });
  if (row.runState === 'queued' || row.runState === 'running') return row;
  await row.update(
    {
      runState: 'queued',
      runProgress: null,
      runError: null,
      requestedAt: new Date(),
      requestedBy: actorId,
      jobId: null,
    },
    { transaction: t },
  );
  t.afterCommit(wakeShopPlanner);
  return row;
}

/** True when the order has lines and every line's design is approved. */
async function allApproved(orderId: number, t: Transaction) {
  const lines = await OrderLine.findAll({
    where: { orderId },
    attributes: ['reviewState'],
    transaction: t,
  });
  return lines.length > 0 && lines.every((l) => l.reviewState === 'approved');
}

/** After an approval: the order's shop plan is queued once its last design is approved. */
export async function queueShopPlanIfReady(t: Transaction, order: Order, actor: User) {
  if (await allApproved(order.id, t)) await queueShopPlan(t, order, actor.id);
}

/** "Re-plan": a new cut list and lumber plan for an order whose designs are all approved. */
export async function replanOrder(actor: User, order: Order) {
  return Order.sequelize!.transaction(async (t) => {
    const locked = await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!locked) throw conflict('The order no longer exists.');
    if (!(await allApproved(order.id, t))) {
      throw conflict('The lumber plan is ready once every line’s design is approved.');
    }
    const row = await queueShopPlan(t, locked, actor.id);
    await audit(t, {
      plantId: order.plantId,
      actorId: actor.id,
      action: 'shop_plan.requested',
      subjectType: 'order',
      subjectId: order.id,
      data: { state: row.runState },
    });
    return row;
  });
}
