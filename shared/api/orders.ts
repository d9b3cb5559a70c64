import { z } from 'zod';
import { listQuerySchema } from './list';
import { acceptanceSchema, orderMoneySchema, paymentSummarySchema } from './portal';

export const ORDER_STATUSES = [
  'draft',
  'quoted',
  'accepted',
  'deposit_paid',
  'released',
  'in_production',
  'ready',
  'delivered',
  'cancelled',
] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

/**
 * Truss lines change only on a draft or a quoted order (a change to a quoted order makes a new
 * revision); once accepted the builder agreed to these trusses and the shop works from them.
 */
export const linesMayChange = (status: OrderStatus): boolean =>
  status === 'draft' || status === 'quoted';

export const REVIEW_STATES = ['pending', 'approved', 'returned'] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

/** Query of `GET /api/orders`. */
export const orderListQuerySchema = listQuerySchema.extend({
  status: z.enum(ORDER_STATUSES).optional(),
  customerId: z.coerce.number().int().positive().optional(),
  jobId: z.coerce.number().int().positive().optional(),
});
export type OrderListQuery = z.infer<typeof orderListQuerySchema>;

/** Body of `POST /api/orders`. */
export const createOrderSchema = z.object({
  jobId: z.number({ message: 'Pick a job' }).int().positive('Pick a job'),
});

const mark = z
  .string()
  .trim()
  .min(1, 'Enter a truss mark, e.g. T1')
  .max(12, 'Use at most 12 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9-]*$/, 'Letters, digits and dashes only, e.g. T1 or G2-A');
const quantity = z
  .number({ message: 'Quantity must be a number' })
  .int('Quantity is a whole number')
  .min(1, 'At least 1')
  .max(999, 'At most 999');
const plies = z
  .number({ message: 'Plies must be a number' })
  .int('Plies is a whole number')
  .min(1, 'At least 1 ply')
  .max(4, 'At most 4 plies');

/**
 * Body of `POST /api/orders/:id/lines`. `design` is the engine's design input (the same as the CLI's
 * design file, checked with `designInputSchema` on the server); the line's `plies` wins over the design's.
 */
export const createLineSchema = z.object({
  mark,
  quantity,
  plies: plies.default(1),
  design: z.record(z.string(), z.unknown(), { message: 'Send the truss design' }),
});
export type CreateLineInput = z.infer<typeof createLineSchema>;

export const updateLineSchema = z
  .object({ mark, quantity, plies, design: z.record(z.string(), z.unknown()) })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateLineInput = z.infer<typeof updateLineSchema>;

/** Body of `POST /api/orders/:id/lines/reorder`: every line id of the order in the new order. */
export const reorderLinesSchema = z.object({
  lineIds: z.array(z.number().int().positive()).min(1, 'Send every line of this order'),
});

/** Body of `POST /api/orders/:id/lines/:lineId/review`. A return needs a comment. */
export const reviewSchema = z
  .object({
    decision: z.enum(['approve', 'return'], { message: 'Approve or return' }),
    comment: z.string().trim().max(2000, 'Use at most 2000 characters').default(''),
    /** The line's `designVersion` the reviewer looked at; a newer design answers 409 `stale`. */
    designVersion: z
      .number({ message: 'Reload the design: the review must name the version you looked at' })
      .int()
      .positive(),
  })
  .refine((r) => r.decision === 'approve' || r.comment.length > 0, {
    message: 'Say what needs to change when you send a design back',
    path: ['comment'],
  });
export type ReviewInput = z.infer<typeof reviewSchema>;

export const lineSummarySchema = z.object({
  id: z.number().int(),
  position: z.number().int(),
  mark: z.string(),
  quantity: z.number().int(),
  plies: z.number().int(),
  profile: z.string(),
  /** Short description in the plant's units, e.g. `Fink 28'-0" 6/12`. */
  description: z.string(),
  designOk: z.boolean(),
  maxCsi: z.number().nullable(),
  warningCount: z.number().int(),
  reviewState: z.enum(REVIEW_STATES),
  reviewComment: z.string().nullable(),
  reviewedBy: z.string().nullable(),
  reviewedAt: z.string().nullable(),
  engineVersion: z.string(),
  /** The job's loads changed after this design: redesign before quoting. */
  loadsOutOfDate: z.boolean(),
  outOfDateReason: z.string().nullable(),
  updatedAt: z.string(),
  /** Raised by every design change; `POST …/review` must name the current one. */
  designVersion: z.number().int(),
});
export type LineSummary = z.infer<typeof lineSummarySchema>;

export const historyEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actor: z.string().nullable(),
  action: z.string(),
  summary: z.string(),
});
export type HistoryEntry = z.infer<typeof historyEntrySchema>;

export const orderSummarySchema = z.object({
  id: z.number().int(),
  number: z.string(),
  status: z.enum(ORDER_STATUSES),
  job: z.object({ id: z.number().int(), name: z.string() }),
  customer: z.object({ id: z.number().int(), name: z.string() }),
  lineCount: z.number().int(),
  trussCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Production planning: the date promised to the builder, and the date the plan now gives. */
  promisedOn: z.string().nullable().default(null),
  plannedDeliveryOn: z.string().nullable().default(null),
  onHold: z.boolean().default(false),
  holdReason: z.string().nullable().default(null),
  /** The order's version: production changes (promise, hold, release, delivery) send it back. */
  version: z.number().int().default(1),
});
export type OrderSummary = z.infer<typeof orderSummarySchema>;

export const orderSchema = orderSummarySchema.extend({
  lines: z.array(lineSummarySchema),
  history: z.array(historyEntrySchema),
  units: z.enum(['imperial', 'metric']),
  // Money and acceptance (shared/api/portal.ts): payments, the accepted total and what is due.
  payments: z.array(paymentSummarySchema).default([]),
  money: orderMoneySchema.nullable().default(null),
  acceptance: acceptanceSchema.nullable().default(null),
});
export type OrderDetail = z.infer<typeof orderSchema>;

/** A stored line with its design input and the server's results (`result` is the presented design). */
export const lineSchema = lineSummarySchema.extend({
  orderId: z.number().int(),
  design: z.record(z.string(), z.unknown()),
  result: z.record(z.string(), z.unknown()),
});
export type LineDetail = z.infer<typeof lineSchema>;

/** One row of the design reviewer's queue (`GET /api/reviews`). */
export const reviewQueueItemSchema = lineSummarySchema.extend({
  order: z.object({ id: z.number().int(), number: z.string() }),
  job: z.object({ id: z.number().int(), name: z.string() }),
  customer: z.object({ id: z.number().int(), name: z.string() }),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>;
