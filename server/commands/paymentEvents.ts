import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import { Order, Payment, PaymentEvent, Quote } from '../models';
import { conflict } from '../errors';
import { audit } from './audit';
import { queueReceipt, receiptNumber, settleDeposit } from './payments';
import { bumpOrderVersion } from './orderVersion';
import { releaseAfterCommit } from './release';

type Meta = { metadata?: Record<string, string> | null };
const orderIdOf = (o: Meta) => {
  const id = Number(o.metadata?.orderId);
  return Number.isSafeInteger(id) && id > 0 ? id : null;
};

/** An order event written by the payment service (no signed-in actor). */
async function serviceEvent(
  t: Transaction,
  order: Order,
  action: string,
  data: Record<string, unknown>,
) {
  await Order.sequelize!.query('UPDATE orders SET updated_at = now() WHERE id = :id', {
    replacements: { id: order.id },
    transaction: t,
  });
  await audit(t, {
    plantId: order.plantId,
    actorId: null,
    action,
    subjectType: 'order',
    subjectId: order.id,
    data,
  });
}

/** A pending card deposit is paid: receipt number, order → deposit paid, audit, receipt e-mail. */
async function markPaid(t: Transaction, order: Order, p: Payment, intentId: string | null) {
  await p.update(
    {
      status: 'succeeded',
      providerPaymentIntentId: intentId ?? p.providerPaymentIntentId,
      paidAt: new Date(),
    },
    { transaction: t },
  );
  await p.update({ receiptNumber: receiptNumber(order, p) }, { transaction: t });
  await serviceEvent(t, order, 'payment.received', {
    paymentId: p.id,
    amountCents: p.amountCents,
    currency: p.currency,
    receiptNumber: p.receiptNumber,
    paymentIntent: p.providerPaymentIntentId,
  });
  await bumpOrderVersion(t, order);
  await settleDeposit(t, order);
  await queueReceipt(
    t,
    order,
    p,
    p.quoteId ? await Quote.findByPk(p.quoteId, { transaction: t }) : null,
  );
}

async function sessionCompleted(t: Transaction, order: Order, s: Stripe.Checkout.Session) {
  if (s.payment_status !== 'paid') return;
  const intentId =
    typeof s.payment_intent === 'string' ? s.payment_intent : (s.payment_intent?.id ?? null);
  const p = await Payment.findOne({ where: { providerSessionId: s.id }, transaction: t });
  if (!p) throw conflict(`No deposit was opened for session ${s.id}.`);
  if (p.status !== 'succeeded') await markPaid(t, order, p, intentId);
  else if (!p.providerPaymentIntentId && intentId)
    await p.update({ providerPaymentIntentId: intentId }, { transaction: t });
}

/** The intent's event may come first: the order's pending deposit of that amount is the one paid. */
async function intentSucceeded(t: Transaction, order: Order, pi: Stripe.PaymentIntent) {
  if (await Payment.findOne({ where: { providerPaymentIntentId: pi.id }, transaction: t })) return;
  const p = await Payment.findOne({
    where: {
      orderId: order.id,
      kind: 'deposit',
      status: 'pending',
      amountCents: pi.amount_received,
      providerSessionId: { [Op.ne]: null },
    },
    order: [['id', 'DESC']],
    transaction: t,
  });
  if (p) await markPaid(t, order, p, pi.id);
}

async function refundCreated(t: Transaction, order: Order, r: Stripe.Refund) {
  const p =
    (await Payment.findOne({ where: { providerRefundId: r.id }, transaction: t })) ??
    (await Payment.findOne({
      where: { id: Number(r.metadata?.paymentId) || 0, orderId: order.id, kind: 'refund' },
      transaction: t,
    }));
  if (!p) throw conflict(`No refund was requested as ${r.id}.`);
  if (p.status === 'succeeded' || r.status !== 'succeeded') return;
  await p.update(
    { status: 'succeeded', providerRefundId: r.id, paidAt: new Date() },
    { transaction: t },
  );
  await p.update({ receiptNumber: receiptNumber(order, p) }, { transaction: t });
  await serviceEvent(t, order, 'refund.succeeded', {
    paymentId: p.id,
    refundId: r.id,
    amountCents: p.amountCents,
    currency: p.currency,
  });
  await bumpOrderVersion(t, order);
  await queueReceipt(t, order, p, null);
}

/**
 * Apply one verified webhook event, once: its id is recorded in the same transaction (primary key),
 * so a replay or a duplicate delivery changes nothing. The order row is locked first, which also
 * waits for a command still writing to it (a refund being requested). Events may come in any order.
 * Returns false for a duplicate.
 */
export async function applyPaymentEvent(event: Stripe.Event): Promise<boolean> {
  const object = event.data.object as Meta;
  const orderId = orderIdOf(object);
  return PaymentEvent.sequelize!.transaction(async (t) => {
    const order = orderId
      ? await Order.findByPk(orderId, { transaction: t, lock: t.LOCK.UPDATE })
      : null;
    const [, fresh] = await PaymentEvent.findOrCreate({
      where: { id: event.id },
      defaults: { id: event.id, type: event.type, orderId: order?.id ?? null },
      transaction: t,
    });
    if (!fresh) return false;
    if (!order) return true;
    // Money in may complete the release gate.
    releaseAfterCommit(t, order.id, null);
    if (event.type === 'checkout.session.completed')
      await sessionCompleted(t, order, event.data.object as Stripe.Checkout.Session);
    else if (event.type === 'payment_intent.succeeded')
      await intentSucceeded(t, order, event.data.object as Stripe.PaymentIntent);
    else if (event.type === 'refund.created' || event.type === 'refund.updated')
      await refundCreated(t, order, event.data.object as Stripe.Refund);
    return true;
  });
}
