import type { Transaction } from 'sequelize';
import { TERMS } from '../../shared/api/terms';
import type { AcceptQuoteInput, RequestChangesInput } from '../../shared/api/portal';
import { Customer, Order, Quote, QuoteAcceptance, User } from '../models';
import { badRequest, conflict } from '../errors';
import type { QuoteSnapshot } from '../services/pricing';
import { formatMoney } from '../services/quotePdf/format';
import { queueMail } from '../services/mailQueue';
import { orderEvent } from './audit';
import { requireSeenVersion } from './orderVersion';
import { releaseAfterCommit } from './release';

const today = () => new Date().toISOString().slice(0, 10);

/** A revision is valid through the date it shows. */
export const isExpired = (q: Quote) => q.validUntil < today();

/** The plant's desk: its active sales users (else its plant managers), for copies of builder mail. */
export async function deskAddresses(plantId: number, t?: Transaction) {
  for (const role of ['sales', 'admin'] as const) {
    const users = await User.findAll({
      where: { plantId, role, active: true },
      attributes: ['email'],
      transaction: t,
    });
    if (users.length) return users.map((u) => u.email).join(', ');
  }
  return null;
}

/** The builder company's address, and the signed-in builder's when it differs. */
async function builderAddresses(order: Order, actor: User, t: Transaction) {
  const customer = await Customer.findByPk(order.customerId, { transaction: t });
  const list = [customer!.email];
  if (actor.role === 'builder' && actor.email !== customer!.email) list.push(actor.email);
  return list.join(', ');
}

/**
 * Why this revision cannot be accepted now, or null: it must be the latest revision, sent, still
 * valid, and the order must still be quoted on it.
 */
export async function acceptRefusal(order: Order, quote: Quote, t?: Transaction) {
  const latest = (await Quote.max('number', {
    where: { orderId: order.id },
    transaction: t,
  })) as number;
  if (quote.number < latest)
    return `${quote.reference} is superseded by revision ${latest}; it can no longer be accepted.`;
  if (!quote.sentAt) return `${quote.reference} has not been sent to the builder yet.`;
  if (order.status === 'draft')
    return 'The order changed after this quote; the plant is preparing a new revision.';
  if (order.status !== 'quoted') return `This order is ${order.status.replace('_', ' ')}.`;
  if (isExpired(quote))
    return `${quote.reference} expired on ${quote.validUntil}; ask the plant for a new quote.`;
  return null;
}

/**
 * Accept a sent revision (the builder, or the desk on the builder's behalf saying how): records
 * who, when, from which address and which revision; the order becomes `accepted`; confirmations go
 * to the builder and the desk through the mail queue. Accepting the same revision again changes
 * nothing and answers the same.
 */
export async function acceptQuote(
  actor: User,
  order: Order,
  quote: Quote,
  input: AcceptQuoteInput,
  ip: string | null,
) {
  const onBehalf = actor.role !== 'builder';
  const method = onBehalf ? input.method : 'portal';
  if (onBehalf && (!method || method === 'portal'))
    throw badRequest('Say how the builder accepted: phone, paper or e-mail.', {
      method: 'Say how the builder accepted',
    });
  if (onBehalf && input.version === undefined)
    throw badRequest('Reload the order: send the version you looked at.', {
      version: 'Reload the order: send the version you looked at',
    });
  return Order.sequelize!.transaction(async (t) => {
    const locked = await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!locked) throw conflict('The order no longer exists.');
    const existing = await QuoteAcceptance.findOne({
      where: { orderId: order.id },
      transaction: t,
    });
    if (existing) {
      if (existing.quoteId === quote.id) return { changed: false };
      throw conflict('This order was already accepted on another revision.');
    }
    if (onBehalf)
      requireSeenVersion(
        locked,
        input.version!,
        'The page now shows it as it is: check it and record the acceptance again.',
      );
    const refusal = await acceptRefusal(locked, quote, t);
    if (refusal) throw conflict(refusal);
    await QuoteAcceptance.create(
      {
        plantId: locked.plantId,
        orderId: locked.id,
        quoteId: quote.id,
        userId: actor.id,
        name: input.name,
        onBehalf,
        method: method!,
        ip,
      },
      { transaction: t },
    );
    await locked.update({ status: 'accepted' }, { transaction: t });
    await orderEvent(t, actor, locked, 'quote.accepted', {
      quoteId: quote.id,
      number: quote.number,
      reference: quote.reference,
      name: input.name,
      onBehalf,
      method,
      ip,
      ...(onBehalf && input.note ? { note: input.note } : {}),
    });
    await acceptanceMail(t, actor, locked, quote, input.name, onBehalf);
    // An account builder's order whose designs are approved goes to production at once.
    releaseAfterCommit(t, locked.id, null);
    return { changed: true };
  });
}

async function acceptanceMail(
  t: Transaction,
  actor: User,
  order: Order,
  quote: Quote,
  name: string,
  onBehalf: boolean,
) {
  const s = quote.snapshot as unknown as QuoteSnapshot;
  const money = (v: number) => formatMoney(v, s.currency);
  const deposit = Number(quote.depositDue);
  const who = onBehalf ? `${name} (recorded by ${actor.name} for the builder)` : name;
  const lines = [
    `${s.customer.name} accepted quote ${quote.reference} for ${s.job.name}.`,
    '',
    `Accepted by: ${who}`,
    `Total: ${money(Number(quote.total))}`,
    deposit > 0
      ? `Deposit due now: ${money(deposit)} — pay it from your Spanwise portal.`
      : `${TERMS.noDeposit}: account terms apply.`,
    '',
    s.cautions.join(' '),
    '',
    s.plant.name,
  ];
  const base = { plantId: order.plantId, orderId: order.id, body: lines.join('\n') };
  await queueMail(t, {
    ...base,
    kind: 'acceptance.builder',
    to: await builderAddresses(order, actor, t),
    subject: onBehalf
      ? `Your acceptance of ${quote.reference} is recorded — ${s.job.name}`
      : `You accepted ${quote.reference} — ${s.job.name}`,
  });
  const desk = await deskAddresses(order.plantId, t);
  if (desk)
    await queueMail(t, {
      ...base,
      kind: 'acceptance.desk',
      to: desk,
      subject: `Accepted: ${quote.reference} by ${s.customer.name}`,
    });
}

/** The builder asks for changes to a revision: kept in the order's history and e-mailed to the desk. */
export async function requestChanges(
  actor: User,
  order: Order,
  quote: Quote,
  input: RequestChangesInput,
) {
  return Order.sequelize!.transaction(async (t) => {
    await orderEvent(t, actor, order, 'quote.changes_requested', {
      quoteId: quote.id,
      number: quote.number,
      reference: quote.reference,
      message: input.message,
    });
    const desk = await deskAddresses(order.plantId, t);
    if (desk)
      await queueMail(t, {
        plantId: order.plantId,
        orderId: order.id,
        kind: 'changes.desk',
        to: desk,
        subject: `Changes asked on ${quote.reference}`,
        body: `${actor.name} (${actor.email}) asks for changes to ${quote.reference}:\n\n${input.message}`,
      });
  });
}

/** The acceptance of an order, with its revision, or null. */
export const findAcceptance = (orderId: number) =>
  QuoteAcceptance.findOne({
    where: { orderId },
    include: [{ model: Quote, as: 'quote', attributes: ['id', 'number', 'reference'] }],
  });
