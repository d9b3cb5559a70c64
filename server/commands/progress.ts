import { QueryTypes } from 'sequelize';
import { STAGES, type ProgressInput, type Stage } from '../../shared/api/production';
import { Order, OrderLine, type User } from '../models';
import { badRequest, conflict, notFound } from '../errors';
import { orderEvent } from './audit';
import { requireSeenVersion } from './orderVersion';
import { replanAndTell } from './schedule';

const COLUMN: Record<Stage, keyof OrderLine> = {
  cut: 'cutCount',
  assembled: 'assembledCount',
  banded: 'bandedCount',
  loaded: 'loadedCount',
  delivered: 'deliveredCount',
};

export const lineCounts = (l: OrderLine) =>
  Object.fromEntries(STAGES.map((s) => [s, l[COLUMN[s]] as number])) as Record<Stage, number>;

/** Orders whose trusses may be worked on the floor. */
const WORKABLE = ['released', 'in_production', 'ready'];

/**
 * Record one change from the floor. The client's id is stored once (unique): a replay of a change
 * already recorded changes nothing and answers the line as it is. A count stays within 0 … quantity
 * and never above the stage before it (no more assembled than cut). The order follows: in
 * production at the first cut, ready when every truss is banded. Re-plans when a line's assembly
 * finishes.
 */
export async function recordProgress(actor: User, input: ProgressInput) {
  return Order.sequelize!.transaction(async (t) => {
    const inserted = await Order.sequelize!.query<{ id: number }>(
      `INSERT INTO progress_events (plant_id, order_line_id, client_id, stage, delta, actor_id, created_at)
       SELECT o.plant_id, l.id, :clientId, :stage, :delta, :actorId, now()
         FROM order_lines l JOIN orders o ON o.id = l.order_id
        WHERE l.id = :lineId AND o.plant_id = :plantId
       ON CONFLICT (client_id) DO NOTHING RETURNING id`,
      {
        replacements: { ...input, actorId: actor.id, plantId: actor.plantId },
        type: QueryTypes.SELECT,
        transaction: t,
      },
    );
    const line = await OrderLine.findByPk(input.lineId, {
      attributes: { exclude: ['designInput', 'designResult'] },
      transaction: t,
    });
    const order =
      line && (await Order.findByPk(line.orderId, { transaction: t, lock: t.LOCK.UPDATE }));
    if (!line || !order || order.plantId !== actor.plantId) throw notFound('Truss line');
    if (inserted.length === 0) {
      await line.reload({ transaction: t });
      return { line, order, replayed: true };
    }
    if (!WORKABLE.includes(order.status))
      throw conflict(
        `Order ${order.number} is ${order.status.replace('_', ' ')}; it is not on the floor.`,
      );
    await line.reload({ transaction: t, lock: t.LOCK.UPDATE });
    const counts = lineCounts(line);
    const i = STAGES.indexOf(input.stage);
    const next = counts[input.stage] + input.delta;
    const cap = i === 0 ? line.quantity : counts[STAGES[i - 1]];
    const floor = i === STAGES.length - 1 ? 0 : counts[STAGES[i + 1]];
    if (next > line.quantity)
      throw badRequest(
        `${line.mark} has ${line.quantity} trusses; ${next} ${input.stage} is too many.`,
      );
    if (next > cap)
      throw badRequest(
        `Only ${cap} of ${line.mark} are ${STAGES[i - 1]}; ${next} cannot be ${input.stage}.`,
      );
    if (next < floor)
      throw badRequest(
        `${floor} of ${line.mark} are already ${STAGES[i + 1]}; ${input.stage} cannot go below.`,
      );
    await line.update({ [COLUMN[input.stage]]: next }, { transaction: t, silent: true });
    await orderEvent(t, actor, order, 'line.progress', {
      lineId: line.id,
      mark: line.mark,
      stage: input.stage,
      delta: input.delta,
      count: next,
      quantity: line.quantity,
    });
    if (order.status === 'released' && input.stage === 'cut' && next > 0) {
      await order.update({ status: 'in_production' }, { transaction: t });
      await orderEvent(t, actor, order, 'order.in_production', {});
    }
    if (order.status === 'in_production' && input.stage === 'banded') {
      const open = await Order.sequelize!.query<{ n: number }>(
        'SELECT count(*)::int AS n FROM order_lines WHERE order_id = :id AND banded_count < quantity',
        { replacements: { id: order.id }, type: QueryTypes.SELECT, transaction: t },
      );
      if (open[0].n === 0) {
        await order.update({ status: 'ready' }, { transaction: t });
        await orderEvent(t, actor, order, 'order.ready', {});
      }
    }
    if (
      input.stage === 'assembled' &&
      (next === line.quantity || counts.assembled === line.quantity)
    )
      await replanAndTell(t, order.plantId);
    return { line, order, replayed: false };
  });
}

/**
 * The delivery is signed off: every truss is loaded, the order becomes delivered and each line's
 * delivered count is its quantity.
 */
export async function signOffDelivery(
  actor: User,
  orderId: number,
  input: { receivedBy: string; receivedAt?: string; note: string; version: number },
) {
  const receivedAt = input.receivedAt ? new Date(input.receivedAt) : new Date();
  // A few minutes' grace for clocks; a delivery signed for tomorrow is a typing slip.
  if (receivedAt.getTime() > Date.now() + 10 * 60_000)
    throw badRequest('The delivery cannot be received in the future.', {
      receivedAt: 'In the future',
    });
  return Order.sequelize!.transaction(async (t) => {
    const order = await Order.findByPk(orderId, { transaction: t, lock: t.LOCK.UPDATE });
    if (!order) throw notFound('Order');
    requireSeenVersion(order, input.version);
    if (order.status !== 'ready')
      throw conflict('Only an order that is ready (every truss banded) can be delivered.');
    const lines = await OrderLine.findAll({
      where: { orderId },
      attributes: { exclude: ['designInput', 'designResult'] },
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    const short = lines.filter((l) => l.loadedCount < l.quantity).map((l) => l.mark);
    if (short.length) throw conflict(`Load every truss first: ${short.join(', ')} not all loaded.`);
    for (const l of lines)
      await l.update({ deliveredCount: l.quantity }, { transaction: t, silent: true });
    await order.update({ status: 'delivered' }, { transaction: t });
    await orderEvent(t, actor, order, 'order.delivered', {
      receivedBy: input.receivedBy,
      receivedAt: receivedAt.toISOString(),
      note: input.note || undefined,
    });
    return order;
  });
}
