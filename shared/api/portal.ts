// zod/mini: the builder's portal parses these on a phone (see shared/api/auth.ts).
import * as z from 'zod/mini';
import { quoteSchema } from './pricing';

/** How a quote was accepted: in the portal, or recorded by the desk on the builder's behalf. */
export const ACCEPTANCE_METHODS = ['portal', 'phone', 'paper', 'email'] as const;

/**
 * Body of `POST /api/orders/:id/quotes/:number/accept`. The builder types their name and ticks the
 * terms; the desk recording an acceptance says how it came (`method`, not `portal`).
 */
export const acceptQuoteSchema = z.object({
  name: z
    .string({ error: 'Type your full name' })
    .check(
      z.trim(),
      z.minLength(2, 'Type your full name'),
      z.maxLength(120, 'Use at most 120 characters'),
    ),
  agree: z.literal(true, { error: 'Tick the box to accept the terms' }),
  method: z.optional(z.enum(ACCEPTANCE_METHODS, { error: 'Phone, paper or e-mail' })),
  /** The desk's note of how and when it came ("signed copy faxed Tuesday"); kept in the history. */
  note: z.optional(z.string().check(z.trim(), z.maxLength(1000, 'Use at most 1000 characters'))),
  /**
   * The order's version the desk saw when it recorded the acceptance (required of the desk, 409
   * `stale` when the order changed since); the builder's own acceptance may leave it out.
   */
  version: z.optional(
    z
      .int({ error: 'Reload the order: send the version you looked at' })
      .check(z.positive('Reload the order: send the version you looked at')),
  ),
});
export type AcceptQuoteInput = z.infer<typeof acceptQuoteSchema>;

/** Body of `POST /api/orders/:id/quotes/:number/changes`: what the builder wants changed. */
export const requestChangesSchema = z.object({
  message: z
    .string({ error: 'Say what should change' })
    .check(
      z.trim(),
      z.minLength(3, 'Say what should change'),
      z.maxLength(4000, 'Use at most 4000 characters'),
    ),
});
export type RequestChangesInput = z.infer<typeof requestChangesSchema>;

export const acceptanceSchema = z.object({
  quoteNumber: z.int(),
  reference: z.string(),
  name: z.string(),
  onBehalf: z.boolean(),
  method: z.enum(ACCEPTANCE_METHODS),
  acceptedAt: z.string(),
});
export type Acceptance = z.infer<typeof acceptanceSchema>;

/** One payment as the order shows it; amounts in the currency's major unit (dollars). */
export const paymentSummarySchema = z.object({
  id: z.int(),
  kind: z.enum(['deposit', 'offline', 'refund']),
  method: z.enum(['card', 'cheque', 'transfer', 'cash']),
  amount: z.number(),
  currency: z.string(),
  status: z.enum(['pending', 'succeeded', 'failed']),
  reference: z.nullable(z.string()),
  receiptNumber: z.nullable(z.string()),
  paidAt: z.nullable(z.string()),
});
export type PaymentSummary = z.infer<typeof paymentSummarySchema>;

/** The money side of an order: the accepted total, what was paid, the deposit still due. */
export const orderMoneySchema = z.object({
  currency: z.string(),
  total: z.number(),
  paid: z.number(),
  balance: z.number(),
  depositDue: z.number(),
  /** The deposit the accepted revision asks for (what was due before anything was paid). */
  deposit: z._default(z.number(), 0),
  /** Refunds sent back (already taken off `paid`). */
  refunded: z._default(z.number(), 0),
});
export type OrderMoney = z.infer<typeof orderMoneySchema>;

/** `POST /api/orders/:id/deposit` → 201. */
export const depositSessionSchema = z.object({
  url: z.string(),
  amount: z.number(),
  currency: z.string(),
  sessionId: z.string(),
});
export type DepositSession = z.infer<typeof depositSessionSchema>;

/** Body of `POST /api/orders/:id/payments`: a cheque or transfer the desk received. */
export const offlinePaymentSchema = z.object({
  amount: z
    .number({ error: 'Enter the amount received' })
    .check(
      z.positive('Enter the amount received'),
      z.maximum(10_000_000, 'That amount looks too large'),
    ),
  method: z.enum(['cheque', 'transfer', 'cash'], { error: 'Cheque, transfer or cash' }),
  reference: z
    .string({ error: 'Enter the cheque number or transfer reference' })
    .check(
      z.trim(),
      z.minLength(1, 'Enter the cheque number or transfer reference'),
      z.maxLength(120, 'Use at most 120 characters'),
    ),
  /**
   * The order's `version` the desk saw: a payment recorded meanwhile (another tab, a colleague, a
   * card deposit) raises it, so the same cheque is not entered twice (409 `stale`).
   */
  version: z
    .int({ error: 'Reload the order: send the version you looked at' })
    .check(z.positive('Reload the order: send the version you looked at')),
});
export type OfflinePaymentInput = z.infer<typeof offlinePaymentSchema>;

/** Body of `POST /api/orders/:id/cancel`. */
export const cancelOrderSchema = z.object({
  reason: z
    .string({ error: 'Say why the order is cancelled' })
    .check(
      z.trim(),
      z.minLength(3, 'Say why the order is cancelled'),
      z.maxLength(2000, 'Use at most 2000 characters'),
    ),
});

/** A quote revision as a builder reads it: only sent revisions, with whether it can be accepted. */
export const builderQuoteSchema = z.extend(quoteSchema, {
  expired: z.boolean(),
  /** Why it cannot be accepted now (superseded, expired, already accepted …), or null. */
  refusal: z.nullable(z.string()),
  acceptance: z.nullable(acceptanceSchema),
  units: z.enum(['imperial', 'metric']),
  designs: z.array(
    z.object({
      mark: z.string(),
      description: z.string(),
      span: z.string(),
      rise: z.string(),
      pitch: z.nullable(z.string()),
      joints: z.array(z.object({ id: z.string(), x: z.number(), y: z.number() })),
      members: z.array(z.object({ from: z.string(), to: z.string(), role: z.string() })),
    }),
  ),
});
export type BuilderQuote = z.infer<typeof builderQuoteSchema>;

/** The delivery state of one queued e-mail (the desk's view of the outbox). */
export const mailStateSchema = z.object({
  id: z.int(),
  kind: z.string(),
  to: z.string(),
  subject: z.string(),
  status: z.enum(['queued', 'retrying', 'sent', 'failed']),
  attempts: z.int(),
  lastError: z.nullable(z.string()),
  createdAt: z.string(),
  sentAt: z.nullable(z.string()),
});
export type MailState = z.infer<typeof mailStateSchema>;

/** One step of the order's timeline as the builder sees it. */
export const timelineStepSchema = z.object({
  status: z.string(),
  label: z.string(),
  at: z.nullable(z.string()),
});
export type TimelineStep = z.infer<typeof timelineStepSchema>;

const homeOrder = {
  orderId: z.int(),
  orderNumber: z.string(),
  job: z.string(),
  status: z.string(),
};

/** `GET /api/portal/home`: what needs the builder now. */
export const portalHomeSchema = z.object({
  quotesWaiting: z.array(
    z.object({
      ...homeOrder,
      number: z.int(),
      reference: z.string(),
      total: z.number(),
      currency: z.string(),
      validUntil: z.string(),
      daysLeft: z.int(),
    }),
  ),
  depositsDue: z.array(
    z.object({ ...homeOrder, reference: z.string(), amount: z.number(), currency: z.string() }),
  ),
  inProgress: z.array(z.object({ ...homeOrder, plannedDelivery: z.nullable(z.string()) })),
  messages: z.array(
    z.object({
      id: z.int(),
      orderId: z.nullable(z.int()),
      subject: z.string(),
      at: z.string(),
    }),
  ),
});
export type PortalHome = z.infer<typeof portalHomeSchema>;
