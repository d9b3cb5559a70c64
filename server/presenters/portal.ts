import type { HistoryEntry } from '../../shared/api/orders';
import type {
  Acceptance,
  BuilderQuote,
  MailState,
  OrderMoney,
  PaymentSummary,
} from '../../shared/api/portal';
import type { AuditEvent, MailMessage, Payment, Quote, QuoteAcceptance, User } from '../models';
import type { QuoteSnapshot } from '../services/pricing';
import { presentQuote } from './quote';
import { formatMoney } from '../services/quotePdf/format';

const dollars = (cents: number) => Math.round(cents) / 100;

export function presentAcceptance(a: QuoteAcceptance | null, quote?: Quote): Acceptance | null {
  const q = a?.quote ?? quote;
  if (!a || !q) return null;
  return {
    quoteNumber: q.number,
    reference: q.reference,
    name: a.name,
    onBehalf: a.onBehalf,
    method: a.method,
    acceptedAt: a.acceptedAt.toISOString(),
  };
}

/** A sent revision as the builder reads it: prices without costs, drawings, and whether it can be accepted. */
export function presentBuilderQuote(
  q: Quote,
  superseded: boolean,
  viewer: User,
  refusal: string | null,
  expired: boolean,
  acceptance: QuoteAcceptance | null,
): BuilderQuote {
  const s = q.snapshot as unknown as QuoteSnapshot;
  const accepted = acceptance?.quoteId === q.id ? acceptance : null;
  return {
    ...presentQuote(q, superseded, viewer),
    // The desk's name and the sending address are the plant's business.
    createdBy: null,
    expired,
    refusal: accepted ? null : refusal,
    acceptance: presentAcceptance(accepted, q),
    units: s.units,
    designs: s.designs.map((d) => ({
      mark: d.mark,
      description: d.description,
      span: d.span,
      rise: d.rise,
      pitch: d.pitch,
      joints: d.joints,
      members: d.members,
    })),
  };
}

export function presentPayment(p: Payment): PaymentSummary {
  return {
    id: p.id,
    kind: p.kind,
    method: p.method,
    amount: dollars(p.amountCents),
    currency: p.currency,
    status: p.status,
    reference: p.reference,
    receiptNumber: p.receiptNumber,
    paidAt: p.paidAt?.toISOString() ?? null,
  };
}

/** The accepted total, what was paid (refunds taken off), the balance and the deposit still due. */
export function presentMoney(quote: Quote | null, payments: Payment[]): OrderMoney | null {
  if (!quote) return null;
  const s = quote.snapshot as unknown as QuoteSnapshot;
  const moved = payments.filter((p) => p.status === 'succeeded');
  const paidCents = moved.reduce(
    (sum, p) => sum + (p.kind === 'refund' ? -p.amountCents : p.amountCents),
    0,
  );
  const refundedCents = moved
    .filter((p) => p.kind === 'refund')
    .reduce((sum, p) => sum + p.amountCents, 0);
  const totalCents = Math.round(Number(quote.total) * 100);
  const depositCents = Math.round(Number(quote.depositDue) * 100);
  return {
    currency: s.currency,
    total: dollars(totalCents),
    paid: dollars(paidCents),
    balance: dollars(totalCents - paidCents),
    depositDue: dollars(Math.max(0, depositCents - paidCents)),
    deposit: dollars(depositCents),
    refunded: dollars(refundedCents),
  };
}

export function presentMailState(m: MailMessage): MailState {
  return {
    id: m.id,
    kind: m.kind,
    to: m.toAddress,
    subject: m.subject,
    status: m.status,
    attempts: m.attempts,
    lastError: m.lastError,
    createdAt: m.createdAt.toISOString(),
    sentAt: m.sentAt?.toISOString() ?? null,
  };
}

const d = (e: AuditEvent, k: string) => String(e.data[k] ?? '');
/** How an acceptance recorded by the desk reached it, in words. */
const METHOD_WORDS: Record<string, string> = { phone: 'phone', paper: 'paper', email: 'e-mail' };
const money = (e: AuditEvent) =>
  formatMoney(Number(e.data.amountCents ?? 0) / 100, d(e, 'currency') || 'USD');

/**
 * The order's history written for the builder: what the plant sent them and what they did, the
 * money, and the order's progress. Line edits, design reviews, reviewers' comments and quotes the
 * plant has not sent stay out.
 */
const BUILDER_SUMMARIES: Record<string, (e: AuditEvent) => string> = {
  'quote.sent': (e) => `Quote ${d(e, 'reference')} sent to you`,
  'quote.accepted': (e) =>
    e.data.onBehalf
      ? `${d(e, 'reference')} accepted for you by the plant (${METHOD_WORDS[d(e, 'method')] ?? d(e, 'method')}, ${d(e, 'name')})`
      : `You accepted ${d(e, 'reference')} (${d(e, 'name')})`,
  'quote.changes_requested': (e) =>
    `You asked for changes to ${d(e, 'reference')}: ${d(e, 'message')}`,
  'payment.received': (e) => `Deposit received: ${money(e)}, receipt ${d(e, 'receiptNumber')}`,
  'payment.recorded': (e) =>
    `Payment received (${d(e, 'method')}): ${money(e)}, receipt ${d(e, 'receiptNumber')}`,
  'order.cancelled': () => 'Order cancelled',
  'refund.succeeded': (e) => `Refund sent: ${money(e)}`,
  'order.status': (e) => `Order ${d(e, 'to').replace('_', ' ')}`,
};

export function presentBuilderHistory(events: AuditEvent[]): HistoryEntry[] {
  return events
    .filter((e) => e.action in BUILDER_SUMMARIES)
    .map((e) => ({
      id: Number(e.id),
      at: e.createdAt.toISOString(),
      actor: null,
      action: e.action,
      summary: BUILDER_SUMMARIES[e.action](e),
    }));
}

/** The desk's words for the events this feature adds (the order page's history). */
export function summarizePortalEvent(e: AuditEvent): string | null {
  switch (e.action) {
    case 'quote.accepted':
      return `Accepted ${d(e, 'reference')} as “${d(e, 'name')}”${e.data.onBehalf ? ` on the builder's behalf (by ${METHOD_WORDS[d(e, 'method')] ?? d(e, 'method')})${e.data.note ? `: ${d(e, 'note')}` : ''}` : ` in the portal from ${d(e, 'ip')}`}`;
    case 'quote.changes_requested':
      return `Builder asked for changes to ${d(e, 'reference')}: ${d(e, 'message')}`;
    case 'payment.received':
      return `Card deposit received: ${money(e)} (receipt ${d(e, 'receiptNumber')})`;
    case 'payment.recorded':
      return `Recorded ${d(e, 'method')} payment ${money(e)}, reference ${d(e, 'reference')}`;
    case 'order.cancelled':
      return `Cancelled: ${d(e, 'reason')}`;
    case 'refund.requested':
      return `Refund requested: ${money(e)} (cancellation fee ${formatMoney(Number(e.data.feeCents ?? 0) / 100, d(e, 'currency') || 'USD')})`;
    case 'refund.succeeded':
      return `Refund completed: ${money(e)}`;
    case 'deposit.session':
      return `Deposit checkout opened for ${money(e)}`;
    default:
      return null;
  }
}
