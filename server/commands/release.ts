import type { Transaction } from 'sequelize';
import { Customer, Order, OrderLine, type User } from '../models';
import { badRequest, conflict } from '../errors';
import { logger } from '../logger';
import { releaseBlockers, type ReleaseFacts } from '../policies/release';
import { formatDay, queueBuilderMail } from '../services/productionMail';
import { audit } from './audit';
import { requireSeenVersion } from './orderVersion';
import { plannedDelivery, replanAndTell, SCHEDULED_STATUSES } from './schedule';

/** Lock the order, then read what the release gate needs (order, then lines: the lock order). */
async function lockFacts(orderId: number, t: Transaction) {
  const order = await Order.findByPk(orderId, { transaction: t, lock: t.LOCK.UPDATE });
  if (!order) throw conflict('The order no longer exists.');
  const lines = await OrderLine.findAll({
    where: { orderId },
    attributes: ['id', 'reviewState'],
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  const customer = await Customer.findByPk(order.customerId, { transaction: t });
  const facts: ReleaseFacts = {
    status: order.status,
    onHold: order.onHold,
    reviewStates: lines.map((l) => l.reviewState),
    terms: customer!.terms,
  };
  return { order, customer: customer!, facts };
}

const event = (t: Transaction, actor: User | null, order: Order, action: string, data: object) =>
  audit(t, {
    plantId: order.plantId,
    actorId: actor?.id ?? null,
    action,
    subjectType: 'order',
    subjectId: order.id,
    data: data as Record<string, unknown>,
  });

/** Release inside the transaction: status, time, audit, re-plan, the builder's e-mail queued. */
async function release(
  t: Transaction,
  actor: User | null,
  order: Order,
  customer: Customer,
  data: Record<string, unknown>,
) {
  await order.update(
    { status: 'released', releasedAt: new Date(), onHold: false, holdReason: null },
    { transaction: t },
  );
  await event(t, actor, order, 'order.released', data);
  await replanAndTell(t, order.plantId, { quiet: order.id });
  await order.reload({ transaction: t });
  const planned = plannedDelivery(order);
  await queueBuilderMail(t, [
    {
      plantId: order.plantId,
      orderId: order.id,
      kind: 'production.released',
      to: customer.email,
      subject: `Order ${order.number} is released to production`,
      text:
        `Your order ${order.number} is released to production.` +
        (planned ? ` Planned delivery: ${formatDay(planned)}.` : '') +
        '\n\nWe will tell you if the date changes.',
    },
  ]);
}

/**
 * Release the order by itself if the gate (`releaseBlockers`) allows. One transaction; `actor` is
 * null for the system (a payment event). Returns whether it released. Commands that may complete
 * the gate call {@link releaseAfterCommit} rather than this.
 */
export async function releaseIfReady(actor: User | null, orderId: number) {
  return Order.sequelize!.transaction(async (t) => {
    const { order, customer, facts } = await lockFacts(orderId, t);
    if (releaseBlockers(facts).length > 0) return false;
    await release(t, actor, order, customer, { automatic: true });
    return true;
  });
}

/**
 * The after-commit step of a command that may complete the release gate (a design approved, a
 * deposit paid, a quote accepted on account terms): once its transaction commits, release the
 * order by itself in a transaction of its own. A failure there leaves the command's change standing
 * and is logged; the next approval, payment or a manual release catches up.
 */
export function releaseAfterCommit(t: Transaction, orderId: number | null, actor: User | null) {
  if (orderId === null) return;
  t.afterCommit(async () => {
    try {
      await releaseIfReady(actor, orderId);
    } catch (err) {
      logger.warn({ err, orderId }, 'automatic release failed');
    }
  });
}

/**
 * The plant manager releases by hand with a reason: overrides the deposit and a hold, never the
 * design review. On an already released order it lifts a hold and puts it back on the schedule.
 */
export async function releaseByHand(
  actor: User,
  orderId: number,
  input: { reason: string; version: number },
) {
  await Order.sequelize!.transaction(async (t) => {
    const { order, customer, facts } = await lockFacts(orderId, t);
    requireSeenVersion(order, input.version);
    const { reason } = input;
    if (SCHEDULED_STATUSES.includes(order.status as never)) {
      if (!order.onHold) throw conflict(`Order ${order.number} is already released.`);
      await order.update({ onHold: false, holdReason: null }, { transaction: t });
      await event(t, actor, order, 'order.hold_lifted', { reason });
      await replanAndTell(t, order.plantId);
      return;
    }
    const why = releaseBlockers(facts, { ignorePayment: true });
    if (why.length) throw conflict(why.join(' '));
    await release(t, actor, order, customer, { manual: true, reason });
  });
}

/** The plant manager holds an order with a reason: no automatic release, off the schedule. */
export async function holdOrder(
  actor: User,
  orderId: number,
  input: { reason: string; version: number },
) {
  await Order.sequelize!.transaction(async (t) => {
    const { order } = await lockFacts(orderId, t);
    requireSeenVersion(order, input.version);
    if (order.onHold) throw conflict(`Order ${order.number} is already on hold.`);
    if (!['accepted', 'deposit_paid', ...SCHEDULED_STATUSES].includes(order.status))
      throw conflict(`A ${order.status.replace('_', ' ')} order cannot be held.`);
    await order.update({ onHold: true, holdReason: input.reason }, { transaction: t });
    await event(t, actor, order, 'order.held', { reason: input.reason });
    await replanAndTell(t, order.plantId);
  });
}

const PROMISABLE = ['accepted', 'deposit_paid', 'released', 'in_production', 'ready'];

/**
 * The desk sets the promised delivery date (when the order is accepted) or changes it with a
 * reason; audited, re-planned, and the builder is told of a change.
 */
export async function setPromisedDate(
  actor: User,
  orderId: number,
  input: { promisedOn: string; reason: string; version: number },
) {
  await Order.sequelize!.transaction(async (t) => {
    const { order, customer } = await lockFacts(orderId, t);
    requireSeenVersion(order, input.version);
    if (!PROMISABLE.includes(order.status))
      throw conflict('A delivery date is promised once the builder has accepted the order.');
    const before = order.promisedOn;
    if (before === input.promisedOn) return;
    if (before && input.reason.length < 3)
      throw badRequest('Say why the promised date changes.', { reason: 'Give a reason' });
    await order.update({ promisedOn: input.promisedOn }, { transaction: t });
    await event(t, actor, order, 'order.promised', {
      from: before,
      to: input.promisedOn,
      reason: input.reason || undefined,
    });
    await replanAndTell(t, order.plantId, { quiet: order.id });
    if (before)
      await queueBuilderMail(t, [
        {
          plantId: order.plantId,
          orderId: order.id,
          kind: 'production.promised',
          to: customer.email,
          subject: `Order ${order.number}: delivery date changed to ${formatDay(input.promisedOn)}`,
          text:
            `The promised delivery date of your order ${order.number} changed from ` +
            `${formatDay(before)} to ${formatDay(input.promisedOn)}.\nReason: ${input.reason}`,
        },
      ]);
  });
}
