import { DESIGN_CAUTIONS, type PresentedDesign } from '../../shared/engine/design';
import { depositSentence, validUntilText } from '../../shared/api/terms';
import { Customer, Job, Order, OrderLine, Plant, Quote, type User } from '../models';
import { AppError, conflict } from '../errors';
import { greetingName, quoteRecipients, type QuoteRecipient } from '../../shared/api/quoteSend';
import { queueMail } from '../services/mailQueue';
import { priceQuote, summarizeDesign, type QuoteSnapshot } from '../services/pricing';
import { formatMoney } from '../services/quotePdf/format';
import { orderEvent } from './audit';
import { stableJson } from './lineMarks';
import { pricesFor } from './priceBook';

/** Orders that may take a new quote revision: a draft, or one already quoted. */
const QUOTABLE = new Set(['draft', 'quoted']);

const isoDate = (d: Date) => d.toISOString().slice(0, 10);
const addDays = (d: Date, days: number) => new Date(d.getTime() + days * 86_400_000);

/** A new snapshot that says exactly what the stored revision says. */
const sameQuote = (previous: Quote, snapshot: QuoteSnapshot) =>
  stableJson(previous.snapshot) === stableJson(snapshot);

/** Why an order's lines cannot be quoted yet, or null when they can. */
function quoteRefusal(lines: OrderLine[]): string | null {
  if (lines.length === 0) return 'This order has no truss lines to quote yet.';
  const stale = lines.filter((l) => l.loadsOutOfDate).map((l) => l.mark);
  if (stale.length)
    return `The job’s loads changed after ${stale.join(', ')} ${stale.length === 1 ? 'was' : 'were'} designed. Redesign ${stale.length === 1 ? 'it' : 'them'} with the current loads before quoting.`;
  const failing = lines.filter((l) => !l.designOk).map((l) => l.mark);
  if (failing.length === 0) return null;
  const which = failing.length === 1 ? `the design of ${failing[0]} fails` : '';
  const many = `the designs of ${failing.join(', ')} fail`;
  return `Cannot quote while ${which || many} its checks. Fix or remove ${failing.join(', ')} first.`;
}

/**
 * Write the next immutable quote revision of an order (1, 2, …; "<order number>-Q<n>") from its
 * stored line designs and the plant's price book; the order becomes `quoted`.
 */
export async function createQuote(actor: User, order: Order) {
  return Order.sequelize!.transaction(async (t) => {
    // The order row lock serialises revision numbers and keeps lines still while they are priced.
    const locked = await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!locked) throw conflict('The order no longer exists.');
    if (!QUOTABLE.has(locked.status))
      throw conflict(
        `This order is ${locked.status.replace('_', ' ')}; it cannot be quoted again.`,
      );
    const lines = await OrderLine.findAll({
      where: { orderId: order.id },
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction: t,
      lock: t.LOCK.UPDATE, // after the order's lock, as every order command does
    });
    const refusal = quoteRefusal(lines);
    if (refusal) throw conflict(refusal);

    // One after another: a transaction's queries share one connection.
    const customer = await Customer.findByPk(locked.customerId, { transaction: t });
    const job = await Job.findByPk(locked.jobId, { transaction: t });
    const plant = await Plant.findByPk(locked.plantId, { transaction: t });
    const prices = await pricesFor(locked.plantId, t);
    const last = (await Quote.max('number', { where: { orderId: order.id }, transaction: t })) as
      number | null;
    const designs = lines.map((l) => ({
      line: l,
      design: l.designResult as unknown as PresentedDesign,
    }));
    const price = priceQuote(
      designs.map(({ line, design }) => ({
        mark: line.mark,
        description: line.description,
        quantity: line.quantity,
        plies: line.plies,
        design,
      })),
      prices.book,
      customer!.terms,
    );
    const snapshot: QuoteSnapshot = {
      currency: prices.book.currency,
      units: plant!.units,
      plant: {
        name: plant!.name,
        address: plant!.address,
        ...(plant!.settings?.phone && { phone: plant!.settings.phone }),
        ...(plant!.settings?.email && { email: plant!.settings.email }),
      },
      customer: {
        id: customer!.id,
        name: customer!.name,
        email: customer!.email,
        terms: customer!.terms,
      },
      job: { id: job!.id, name: job!.name, address: job!.address },
      order: { id: locked.id, number: locked.number },
      price,
      designs: designs.map(({ line, design }) =>
        summarizeDesign({
          mark: line.mark,
          description: line.description,
          maxCsi: line.maxCsi,
          reviewState: line.reviewState,
          engineVersion: line.engineVersion,
          designInput: line.designInput,
          design,
        }),
      ),
      terms: prices.book.terms,
      cautions: [...DESIGN_CAUTIONS],
      demoPrices: prices.demo,
    };
    const previous = last
      ? await Quote.findOne({ where: { orderId: order.id, number: last }, transaction: t })
      : null;
    if (previous && previous.validUntil >= isoDate(new Date()) && sameQuote(previous, snapshot))
      throw new AppError(
        409,
        'quote_unchanged',
        `Nothing has changed since ${previous.reference} (valid until ${previous.validUntil}). Open that revision instead of making an identical one.`,
        { number: String(previous.number) },
      );
    const number = (last ?? 0) + 1;
    const createdAt = new Date();
    const quote = await Quote.create(
      {
        plantId: locked.plantId,
        orderId: locked.id,
        number,
        reference: `${locked.number}-Q${number}`,
        snapshot: snapshot as unknown as Record<string, unknown>,
        total: price.total,
        depositDue: price.depositDue,
        validUntil: isoDate(addDays(createdAt, prices.book.quoteValidityDays)),
        createdBy: actor.id,
        createdAt,
      },
      { transaction: t },
    );
    await locked.update({ status: 'quoted' }, { transaction: t });
    await orderEvent(t, actor, locked, 'quote.created', {
      quoteId: quote.id,
      number,
      reference: quote.reference,
      total: price.total,
      currency: snapshot.currency,
      demoPrices: prices.demo,
    });
    return quote;
  });
}

/** The plain-text e-mail of a quote: reference, total, deposit, validity and the cautions. */
export function quoteMessage(quote: Quote, greet?: string) {
  const s = quote.snapshot as unknown as QuoteSnapshot;
  const money = (v: number) => formatMoney(v, s.currency);
  const deposit = depositSentence(s.price.depositDue, money);
  return {
    subject: `Truss quote ${quote.reference} — ${s.job.name}`,
    text: [
      `Hello ${greet ?? s.customer.name},`,
      '',
      `Please find attached our quote ${quote.reference} for ${s.job.name} (${s.job.address}).`,
      '',
      `Total: ${money(s.price.total)} (including delivery and tax).`,
      deposit,
      `${validUntilText(quote.validUntil)}.`,
      '',
      s.cautions.join(' '),
      '',
      s.plant.name,
    ].join('\n'),
  };
}

/**
 * The people a quote goes to: the chosen addresses, each one of the builder's contacts with an
 * address or the company's own; none chosen means the company's address.
 */
function chooseRecipients(customer: Customer, chosen: string[] | undefined): QuoteRecipient[] {
  const known = quoteRecipients(customer);
  if (chosen === undefined) return [{ email: customer.email, name: customer.name, company: true }];
  const byEmail = new Map(known.map((r) => [r.email, r]));
  const unknown = chosen.filter((e) => !byEmail.has(e));
  if (unknown.length)
    throw new AppError(
      400,
      'unknown_recipient',
      `${unknown.join(', ')} is not an address of ${customer.name}; add the contact to the builder first.`,
      { recipients: 'Choose from the builder’s contacts' },
    );
  return [...new Set(chosen)].map((e) => byEmail.get(e)!);
}

/**
 * Send the latest revision to the builder's chosen people: one e-mail each, greeting them by
 * name (the PDF attached when it goes out), joins the mail queue in the same transaction that
 * records when and to whom it went (the only columns a quote lets change).
 */
export async function sendQuote(actor: User, order: Order, quote: Quote, chosen?: string[]) {
  const latest = (await Quote.max('number', { where: { orderId: order.id } })) as number;
  if (quote.number !== latest)
    throw conflict(
      `${quote.reference} is superseded by revision ${latest}; send the latest quote.`,
    );
  if (order.status === 'draft')
    throw conflict('The order changed after this quote; make a new revision before sending it.');
  const customer = await Customer.findByPk(order.customerId);
  const recipients = chooseRecipients(customer!, chosen);
  const to = recipients.map((r) => r.email).join(', ');
  return Order.sequelize!.transaction(async (t) => {
    await quote.update({ sentAt: new Date(), sentTo: to.slice(0, 200) }, { transaction: t });
    for (const r of recipients) {
      const message = quoteMessage(quote, greetingName(r));
      await queueMail(t, {
        plantId: order.plantId,
        orderId: order.id,
        kind: 'quote',
        to: r.email,
        subject: message.subject,
        body: message.text,
        attachment: { type: 'quote', quoteId: quote.id },
      });
    }
    await orderEvent(t, actor, order, 'quote.sent', {
      quoteId: quote.id,
      number: quote.number,
      reference: quote.reference,
      to,
    });
    return quote;
  });
}
