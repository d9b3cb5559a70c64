// zod/mini: a builder's order page parses `orderSchema` (see shared/api/auth.ts).
import * as z from 'zod/mini';
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
const idQuery = (what: string) =>
  z.optional(
    z.coerce
      .number({ error: `Pick a ${what}` })
      .check(z.int(`Pick a ${what}`), z.positive(`Pick a ${what}`)),
  );
export const orderListQuerySchema = z.extend(listQuerySchema, {
  status: z.optional(z.enum(ORDER_STATUSES, { error: 'Pick an order status' })),
  customerId: idQuery('builder'),
  jobId: idQuery('job'),
});
export type OrderListQuery = z.infer<typeof orderListQuerySchema>;

/** Body of `POST /api/orders`. */
export const createOrderSchema = z.object({
  jobId: z.number({ error: 'Pick a job' }).check(z.int('Pick a job'), z.positive('Pick a job')),
});

const mark = z
  .string({ error: 'Enter a truss mark, e.g. T1' })
  .check(
    z.trim(),
    z.minLength(1, 'Enter a truss mark, e.g. T1'),
    z.maxLength(12, 'Use at most 12 characters'),
    z.regex(/^[A-Za-z0-9][A-Za-z0-9-]*$/, 'Letters, digits and dashes only, e.g. T1 or G2-A'),
  );
const quantity = z
  .number({ error: 'Quantity must be a number' })
  .check(
    z.int('Quantity is a whole number'),
    z.minimum(1, 'At least 1'),
    z.maximum(999, 'At most 999'),
  );
const plies = z
  .number({ error: 'Plies must be a number' })
  .check(
    z.int('Plies is a whole number'),
    z.minimum(1, 'At least 1 ply'),
    z.maximum(4, 'At most 4 plies'),
  );
const design = z.record(z.string(), z.unknown(), { error: 'Send the truss design' });

/**
 * Body of `POST /api/orders/:id/lines`. `design` is the engine's design input (the same as the CLI's
 * design file, checked with `designInputSchema` on the server); the line's `plies` wins over the design's.
 */
export const createLineSchema = z.object({
  mark,
  quantity,
  plies: z._default(plies, 1),
  design,
});
export type CreateLineInput = z.infer<typeof createLineSchema>;

export const updateLineSchema = z
  .partial(z.object({ mark, quantity, plies, design }))
  .check(z.refine((v) => Object.keys(v).length > 0, { error: 'Nothing to change' }));
export type UpdateLineInput = z.infer<typeof updateLineSchema>;

/** Body of `POST /api/orders/:id/lines/reorder`: every line id of the order in the new order. */
export const reorderLinesSchema = z.object({
  lineIds: z
    .array(z.int({ error: 'Send line ids' }).check(z.positive('Send line ids')), {
      error: 'Send every line of this order',
    })
    .check(z.minLength(1, 'Send every line of this order')),
});

/** Body of `POST /api/orders/:id/lines/:lineId/review`. A return needs a comment. */
const staleDesign = 'Reload the design: the review must name the version you looked at';
export const reviewSchema = z
  .object({
    decision: z.enum(['approve', 'return'], { error: 'Approve or return' }),
    comment: z._default(
      z.string().check(z.trim(), z.maxLength(2000, 'Use at most 2000 characters')),
      '',
    ),
    /** The line's `designVersion` the reviewer looked at; a newer design answers 409 `stale`. */
    designVersion: z.int({ error: staleDesign }).check(z.positive(staleDesign)),
  })
  .check(
    z.refine((r) => r.decision === 'approve' || r.comment.length > 0, {
      error: 'Say what needs to change when you send a design back',
      path: ['comment'],
    }),
  );
export type ReviewInput = z.infer<typeof reviewSchema>;

export const lineSummarySchema = z.object({
  id: z.int(),
  position: z.int(),
  mark: z.string(),
  quantity: z.int(),
  plies: z.int(),
  profile: z.string(),
  /** Short description in the plant's units, e.g. `Fink 28'-0" 6/12`. */
  description: z.string(),
  designOk: z.boolean(),
  maxCsi: z.nullable(z.number()),
  warningCount: z.int(),
  reviewState: z.enum(REVIEW_STATES),
  reviewComment: z.nullable(z.string()),
  reviewedBy: z.nullable(z.string()),
  reviewedAt: z.nullable(z.string()),
  engineVersion: z.string(),
  /** The job's loads changed after this design: redesign before quoting. */
  loadsOutOfDate: z.boolean(),
  outOfDateReason: z.nullable(z.string()),
  updatedAt: z.string(),
  /** Raised by every design change; `POST …/review` must name the current one. */
  designVersion: z.int(),
});
export type LineSummary = z.infer<typeof lineSummarySchema>;

export const historyEntrySchema = z.object({
  id: z.int(),
  at: z.string(),
  actor: z.nullable(z.string()),
  action: z.string(),
  summary: z.string(),
});
export type HistoryEntry = z.infer<typeof historyEntrySchema>;

export const orderSummarySchema = z.object({
  id: z.int(),
  number: z.string(),
  status: z.enum(ORDER_STATUSES),
  job: z.object({ id: z.int(), name: z.string() }),
  customer: z.object({ id: z.int(), name: z.string() }),
  lineCount: z.int(),
  trussCount: z.int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Production planning: the date promised to the builder, and the date the plan now gives. */
  promisedOn: z._default(z.nullable(z.string()), null),
  plannedDeliveryOn: z._default(z.nullable(z.string()), null),
  onHold: z._default(z.boolean(), false),
  holdReason: z._default(z.nullable(z.string()), null),
  /** The order's version: production changes (promise, hold, release, delivery) send it back. */
  version: z._default(z.int(), 1),
});
export type OrderSummary = z.infer<typeof orderSummarySchema>;

export const orderSchema = z.extend(orderSummarySchema, {
  lines: z.array(lineSummarySchema),
  history: z.array(historyEntrySchema),
  units: z.enum(['imperial', 'metric']),
  // Money and acceptance (shared/api/portal.ts): payments, the accepted total and what is due.
  payments: z._default(z.array(paymentSummarySchema), []),
  money: z._default(z.nullable(orderMoneySchema), null),
  acceptance: z._default(z.nullable(acceptanceSchema), null),
});
export type OrderDetail = z.infer<typeof orderSchema>;

/** A stored line with its design input and the server's results (`result` is the presented design). */
export const lineSchema = z.extend(lineSummarySchema, {
  orderId: z.int(),
  design: z.record(z.string(), z.unknown()),
  result: z.record(z.string(), z.unknown()),
});
export type LineDetail = z.infer<typeof lineSchema>;

/** One row of the design reviewer's queue (`GET /api/reviews`). */
export const reviewQueueItemSchema = z.extend(lineSummarySchema, {
  order: z.object({ id: z.int(), number: z.string() }),
  job: z.object({ id: z.int(), name: z.string() }),
  customer: z.object({ id: z.int(), name: z.string() }),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>;
