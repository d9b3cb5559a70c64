import { z } from 'zod';
import { quoteSchema } from './pricing';

/** How a quote was accepted: in the portal, or recorded by the desk on the builder's behalf. */
export const ACCEPTANCE_METHODS = ['portal', 'phone', 'paper', 'email'] as const;

/**
 * Body of `POST /api/orders/:id/quotes/:number/accept`. The builder types their name and ticks the
 * terms; the desk recording an acceptance says how it came (`method`, not `portal`).
 */
export const acceptQuoteSchema = z.object({
  name: z
    .string({ message: 'Type your full name' })
    .trim()
    .min(2, 'Type your full name')
    .max(120, 'Use at most 120 characters'),
  agree: z.literal(true, { message: 'Tick the box to accept the terms' }),
  method: z.enum(ACCEPTANCE_METHODS).optional(),
});
export type AcceptQuoteInput = z.infer<typeof acceptQuoteSchema>;

/** Body of `POST /api/orders/:id/quotes/:number/changes`: what the builder wants changed. */
export const requestChangesSchema = z.object({
  message: z
    .string({ message: 'Say what should change' })
    .trim()
    .min(3, 'Say what should change')
    .max(4000, 'Use at most 4000 characters'),
});
export type RequestChangesInput = z.infer<typeof requestChangesSchema>;

export const acceptanceSchema = z.object({
  quoteNumber: z.number().int(),
  reference: z.string(),
  name: z.string(),
  onBehalf: z.boolean(),
  method: z.enum(ACCEPTANCE_METHODS),
  acceptedAt: z.string(),
});
export type Acceptance = z.infer<typeof acceptanceSchema>;

/** One payment as the order shows it; amounts in the currency's major unit (dollars). */
export const paymentSummarySchema = z.object({
  id: z.number().int(),
  kind: z.enum(['deposit', 'offline', 'refund']),
  method: z.enum(['card', 'cheque', 'transfer', 'cash']),
  amount: z.number(),
  currency: z.string(),
  status: z.enum(['pending', 'succeeded', 'failed']),
  reference: z.string().nullable(),
  receiptNumber: z.string().nullable(),
  paidAt: z.string().nullable(),
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
  deposit: z.number().default(0),
  /** Refunds sent back (already taken off `paid`). */
  refunded: z.number().default(0),
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
    .number({ message: 'Enter the amount received' })
    .positive('Enter the amount received')
    .max(10_000_000, 'That amount looks too large'),
  method: z.enum(['cheque', 'transfer', 'cash'], { message: 'Cheque, transfer or cash' }),
  reference: z
    .string({ message: 'Enter the cheque number or transfer reference' })
    .trim()
    .min(1, 'Enter the cheque number or transfer reference')
    .max(120),
  /**
   * What the desk saw as paid when it filled the form: a payment recorded meanwhile (another tab,
   * a colleague, a card deposit) answers 409 instead of a second entry of the same cheque.
   */
  expectedPaid: z
    .number({ message: 'Reload the order: the paid amount you saw is missing' })
    .optional(),
});
export type OfflinePaymentInput = z.infer<typeof offlinePaymentSchema>;

/** Body of `POST /api/orders/:id/cancel`. */
export const cancelOrderSchema = z.object({
  reason: z.string().trim().min(3, 'Say why the order is cancelled').max(2000),
});

/** A quote revision as a builder reads it: only sent revisions, with whether it can be accepted. */
export const builderQuoteSchema = quoteSchema.extend({
  expired: z.boolean(),
  /** Why it cannot be accepted now (superseded, expired, already accepted …), or null. */
  refusal: z.string().nullable(),
  acceptance: acceptanceSchema.nullable(),
  units: z.enum(['imperial', 'metric']),
  designs: z.array(
    z.object({
      mark: z.string(),
      description: z.string(),
      span: z.string(),
      rise: z.string(),
      pitch: z.string().nullable(),
      joints: z.array(z.object({ id: z.string(), x: z.number(), y: z.number() })),
      members: z.array(z.object({ from: z.string(), to: z.string(), role: z.string() })),
    }),
  ),
});
export type BuilderQuote = z.infer<typeof builderQuoteSchema>;

/** The delivery state of one queued e-mail (the desk's view of the outbox). */
export const mailStateSchema = z.object({
  id: z.number().int(),
  kind: z.string(),
  to: z.string(),
  subject: z.string(),
  status: z.enum(['queued', 'retrying', 'sent', 'failed']),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
});
export type MailState = z.infer<typeof mailStateSchema>;

/** One step of the order's timeline as the builder sees it. */
export const timelineStepSchema = z.object({
  status: z.string(),
  label: z.string(),
  at: z.string().nullable(),
});
export type TimelineStep = z.infer<typeof timelineStepSchema>;

const homeOrder = {
  orderId: z.number().int(),
  orderNumber: z.string(),
  job: z.string(),
  status: z.string(),
};

/** `GET /api/portal/home`: what needs the builder now. */
export const portalHomeSchema = z.object({
  quotesWaiting: z.array(
    z.object({
      ...homeOrder,
      number: z.number().int(),
      reference: z.string(),
      total: z.number(),
      currency: z.string(),
      validUntil: z.string(),
      daysLeft: z.number().int(),
    }),
  ),
  depositsDue: z.array(
    z.object({ ...homeOrder, reference: z.string(), amount: z.number(), currency: z.string() }),
  ),
  inProgress: z.array(z.object({ ...homeOrder, plannedDelivery: z.string().nullable() })),
  messages: z.array(
    z.object({
      id: z.number().int(),
      orderId: z.number().int().nullable(),
      subject: z.string(),
      at: z.string(),
    }),
  ),
});
export type PortalHome = z.infer<typeof portalHomeSchema>;
