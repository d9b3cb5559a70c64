import type { Transaction } from 'sequelize';
import type { DepositSession, OfflinePaymentInput } from '../../shared/api/portal';
import { Customer, Order, Payment, Quote, User } from '../models';
import { AppError, conflict } from '../errors';
import type { Payments } from '../services/payments';
import type { QuoteSnapshot } from '../services/pricing';
import { formatMoney } from '../services/quotePdf/format';
import { queueMail } from '../services/mailQueue';
import { findAcceptance } from './acceptance';
import { audit, orderEvent } from './audit';
import { pricesFor } from './priceBook';
import { bumpOrderVersion, requireSeenVersion } from './orderVersion';
import { releaseAfterCommit } from './release';

const cents = (v: string | number) => Math.round(Number(v) * 100);

/** Money received on an order so far (refunds taken off), in cents. */
export async function paidCents(orderId: number, t?: Transaction) {
  const rows = await Payment.findAll({ where: { orderId, status: 'succeeded' }, transaction: t });
  return rows.reduce((s, p) => s + (p.kind === 'refund' ? -p.amountCents : p.amountCents), 0);
}

export const requirePayments = (p: Payments | null): Payments => {
  if (!p)
    throw new AppError(
      503,
      'payments_unavailable',
      'Online payment is not configured on this server.',
    );
  return p;
};

/** The accepted revision of an order, or 409 when there is none yet. */
async function acceptedQuote(order: Order, t?: Transaction) {
  const acceptance = await findAcceptance(order.id);
  if (!acceptance) throw conflict('Accept the quote before paying the deposit.');
  return (await Quote.findByPk(acceptance.quoteId, { transaction: t }))!;
}

/**
 * A checkout session for the deposit still due on the accepted revision: the price book's deposit
 * share of the stored total (the quote keeps it, in cents), less anything already received. The
 * idempotency key comes from the order, the revision and the amount, so a double click or a retry
 * gets the same open session; its pending payment row is written once (unique session id).
 */
export async function openDeposit(
  actor: User,
  order: Order,
  payments: Payments,
  returnBase: string,
): Promise<DepositSession> {
  if (order.status === 'deposit_paid' || order.status === 'released')
    throw conflict('The deposit on this order is already paid.');
  if (order.status !== 'accepted')
    throw conflict(
      `A deposit is taken on an accepted order; this one is ${order.status.replace('_', ' ')}.`,
    );
  const quote = await acceptedQuote(order);
  const s = quote.snapshot as unknown as QuoteSnapshot;
  const amount = cents(quote.depositDue) - (await paidCents(order.id));
  if (cents(quote.depositDue) === 0)
    throw conflict('No deposit is due on this order: the builder pays on account terms.');
  if (amount <= 0) throw conflict('The deposit on this order is already paid.');
  const customer = await Customer.findByPk(order.customerId);
  const metadata = {
    orderId: String(order.id),
    quoteId: String(quote.id),
    plantId: String(order.plantId),
  };
  const session = await payments.stripe.checkout.sessions.create(
    {
      mode: 'payment',
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: s.currency.toLowerCase(),
            unit_amount: amount,
            product_data: { name: `Deposit — ${quote.reference}, ${s.job.name}` },
          },
        },
      ],
      client_reference_id: `order-${order.id}`,
      customer_email: customer!.email,
      metadata,
      payment_intent_data: { metadata },
      success_url: `${returnBase}/portal/orders/${order.id}?deposit=done&session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: `${returnBase}/portal/orders/${order.id}?deposit=cancelled`,
    },
    { idempotencyKey: `deposit-order-${order.id}-q${quote.number}-${amount}` },
  );
  await Order.sequelize!.transaction(async (t) => {
    // A second click or a retry gets the same session: its row is written once (a savepoint
    // inside findOrCreate keeps the transaction usable when a concurrent request won).
    const [, created] = await Payment.findOrCreate({
      where: { providerSessionId: session.id },
      defaults: {
        plantId: order.plantId,
        orderId: order.id,
        quoteId: quote.id,
        kind: 'deposit',
        method: 'card',
        amountCents: amount,
        currency: s.currency,
        status: 'pending',
        providerSessionId: session.id,
        recordedBy: actor.id,
      },
      transaction: t,
    });
    if (created)
      await orderEvent(t, actor, order, 'deposit.session', {
        sessionId: session.id,
        amountCents: amount,
        currency: s.currency,
      });
  });
  return { url: session.url!, amount: amount / 100, currency: s.currency, sessionId: session.id };
}

/** Receipt numbers: R-<order number>-<payment id>, unique and readable on the phone. */
export const receiptNumber = (order: Order, p: Payment) => `R-${order.number}-${p.id}`;

/** Mail a receipt (PDF attached when it goes out) to the builder company. */
export async function queueReceipt(t: Transaction, order: Order, p: Payment, quote: Quote | null) {
  const customer = await Customer.findByPk(order.customerId, { transaction: t });
  const money = formatMoney(p.amountCents / 100, p.currency);
  const refund = p.kind === 'refund';
  await queueMail(t, {
    plantId: order.plantId,
    orderId: order.id,
    kind: refund ? 'refund.receipt' : 'receipt',
    to: customer!.email,
    subject: `${refund ? 'Refund' : 'Receipt'} ${p.receiptNumber} — ${money}${quote ? `, ${quote.reference}` : ''}`,
    body: [
      `Hello ${customer!.name},`,
      '',
      refund
        ? `We refunded ${money} on order ${order.number}. The receipt is attached.`
        : `Thank you: we received ${money} on order ${order.number}. The receipt is attached.`,
      '',
      `Receipt: ${p.receiptNumber}`,
    ].join('\n'),
    attachment: { type: 'receipt', paymentId: p.id },
  });
}

/** After money arrives: an accepted order whose deposit is covered becomes `deposit_paid`. */
export async function settleDeposit(t: Transaction, order: Order) {
  if (order.status !== 'accepted') return;
  const acceptance = await findAcceptance(order.id);
  const quote = acceptance ? await Quote.findByPk(acceptance.quoteId, { transaction: t }) : null;
  if (quote && (await paidCents(order.id, t)) >= cents(quote.depositDue))
    await order.update({ status: 'deposit_paid' }, { transaction: t });
}

/** The desk records a cheque, transfer or cash payment with its reference; audited, receipted. */
export async function recordOfflinePayment(actor: User, order: Order, input: OfflinePaymentInput) {
  return Order.sequelize!.transaction(async (t) => {
    const locked = (await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE }))!;
    if (['draft', 'quoted', 'cancelled'].includes(locked.status))
      throw conflict(`Payments are recorded on accepted orders; this one is ${locked.status}.`);
    requireSeenVersion(
      locked,
      input.version,
      'Check the payments below (one may have been recorded meanwhile) before recording this one.',
    );
    const acceptance = await findAcceptance(order.id);
    const quote = acceptance ? await Quote.findByPk(acceptance.quoteId, { transaction: t }) : null;
    const currency = (quote?.snapshot as unknown as QuoteSnapshot | undefined)?.currency ?? 'USD';
    const p = await Payment.create(
      {
        plantId: locked.plantId,
        orderId: locked.id,
        quoteId: quote?.id ?? null,
        kind: 'offline',
        method: input.method,
        amountCents: cents(input.amount),
        currency,
        status: 'succeeded',
        reference: input.reference,
        recordedBy: actor.id,
        paidAt: new Date(),
      },
      { transaction: t },
    );
    await p.update({ receiptNumber: receiptNumber(locked, p) }, { transaction: t });
    await orderEvent(t, actor, locked, 'payment.recorded', {
      paymentId: p.id,
      method: input.method,
      reference: input.reference,
      amountCents: p.amountCents,
      currency,
      receiptNumber: p.receiptNumber,
    });
    await bumpOrderVersion(t, locked);
    await settleDeposit(t, locked);
    await queueReceipt(t, locked, p, quote);
    releaseAfterCommit(t, locked.id, null);
    return p;
  });
}

/** Orders that may still be cancelled: nothing built yet. */
const CANCELLABLE = new Set(['draft', 'quoted', 'accepted', 'deposit_paid', 'released']);

/**
 * The plant manager cancels an order before production. A card deposit is refunded through the SDK,
 * less the price book's cancellation fee; the refund is recorded when its webhook arrives (the order
 * row stays locked until this commits, so the webhook finds the pending refund).
 */
export async function cancelOrder(
  actor: User,
  order: Order,
  reason: string,
  payments: Payments | null,
) {
  return Order.sequelize!.transaction(async (t) => {
    const locked = (await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE }))!;
    if (!CANCELLABLE.has(locked.status))
      throw conflict(`An order ${locked.status.replace('_', ' ')} can no longer be cancelled.`);
    const card = await Payment.findAll({
      where: { orderId: locked.id, kind: 'deposit', status: 'succeeded' },
      order: [['amountCents', 'DESC']],
      transaction: t,
    });
    const cardCents = card.reduce((s, p) => s + p.amountCents, 0);
    const { book } = await pricesFor(locked.plantId, t);
    const feeCents = cents(book.cancellationFee ?? 0);
    const refundCents = Math.min(Math.max(0, cardCents - feeCents), card[0]?.amountCents ?? 0);
    await locked.update({ status: 'cancelled' }, { transaction: t });
    await orderEvent(t, actor, locked, 'order.cancelled', { reason, refundCents, feeCents });
    if (refundCents > 0) {
      const stripe = requirePayments(payments).stripe;
      const refund = await Payment.create(
        {
          plantId: locked.plantId,
          orderId: locked.id,
          quoteId: card[0].quoteId,
          kind: 'refund',
          method: 'card',
          amountCents: refundCents,
          currency: card[0].currency,
          status: 'pending',
          recordedBy: actor.id,
        },
        { transaction: t },
      );
      const r = await stripe.refunds.create(
        {
          payment_intent: card[0].providerPaymentIntentId!,
          amount: refundCents,
          metadata: { orderId: String(locked.id), paymentId: String(refund.id) },
        },
        { idempotencyKey: `refund-order-${locked.id}` },
      );
      await refund.update({ providerRefundId: r.id }, { transaction: t });
      await audit(t, {
        plantId: locked.plantId,
        actorId: actor.id,
        action: 'refund.requested',
        subjectType: 'order',
        subjectId: locked.id,
        data: { refundId: r.id, amountCents: refundCents, feeCents, currency: card[0].currency },
      });
    }
    return locked;
  });
}
