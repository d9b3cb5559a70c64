// zod/mini: a builder's quote page parses `quoteSchema` (see shared/api/auth.ts).
import * as z from 'zod/mini';

const money = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .check(
      z.minimum(0, `${label} cannot be negative`),
      z.maximum(1_000_000, `${label} looks too large`),
    );
const fraction = (label: string, max = 1) =>
  z
    .number({ error: `${label} must be a number` })
    .check(
      z.minimum(0, `${label} cannot be negative`),
      z.maximum(max, `${label} must be at most ${max * 100} %`),
    );

/**
 * The plant's price book (admin writes, sales reads). Money in the plant's currency; fractions as
 * 0–1 (0.25 = 25 %). `margin` is a share of the selling price: price = cost / (1 − margin).
 */
export const priceBookSchema = z.object({
  currency: z._default(
    z
      .string({ error: 'Use a 3-letter currency code, e.g. USD' })
      .check(z.trim(), z.length(3, 'Use a 3-letter currency code, e.g. USD'), z.toUpperCase()),
    'USD',
  ),
  /** Cost per board foot by lumber id ("2x4 SPF-1/2"); `defaultPerBoardFoot` covers any other. */
  lumber: z.object({
    defaultPerBoardFoot: money('Default lumber cost'),
    byLumber: z._default(z.record(z.string(), money('Lumber cost')), {}),
  }),
  /** Cost per plate by catalog id ("4x6-20"); `defaultPerSquareInch` prices any other plate by area. */
  plates: z.object({
    defaultPerSquareInch: money('Default plate cost'),
    byPlate: z._default(z.record(z.string(), money('Plate cost')), {}),
  }),
  /** Labour minutes per truss = perTruss + perPiece × pieces + perJoint × joints, at ratePerHour. */
  labour: z.object({
    perTruss: money('Minutes per truss'),
    perPiece: money('Minutes per piece'),
    perJoint: money('Minutes per joint'),
    ratePerHour: money('Labour rate'),
  }),
  deliveryCharge: money('Delivery charge'),
  margin: fraction('Margin', 0.9),
  taxRate: fraction('Tax rate', 0.5),
  /** Deposit asked of builders without a credit account. */
  depositRate: fraction('Deposit', 1),
  /** Kept from a card deposit when the plant manager cancels an order before production. */
  cancellationFee: z.optional(money('Cancellation fee')),
  quoteValidityDays: z._default(
    z
      .number({ error: 'Whole days' })
      .check(
        z.int('Whole days'),
        z.minimum(1, 'At least 1 day'),
        z.maximum(365, 'At most 365 days'),
      ),
    30,
  ),
  terms: z._default(
    z.string().check(z.trim(), z.maxLength(4000, 'Use at most 4000 characters')),
    '',
  ),
});
export type PriceBook = z.infer<typeof priceBookSchema>;

export const quoteLineSchema = z.object({
  mark: z.string(),
  description: z.string(),
  quantity: z.int(),
  plies: z.int(),
  boardFeet: z.number(),
  // Costs are the plant's own: present for staff, left out of what a builder receives.
  lumberCost: z.optional(z.number()),
  plates: z.array(z.object({ plate: z.string(), count: z.int(), cost: z.optional(z.number()) })),
  plateCost: z.optional(z.number()),
  labourMinutes: z.optional(z.number()),
  labourCost: z.optional(z.number()),
  unitCost: z.optional(z.number()),
  unitPrice: z.number(),
  lineTotal: z.number(),
});
export type QuoteLine = z.infer<typeof quoteLineSchema>;

/** A quote revision: an immutable snapshot (`POST /api/orders/:id/quotes` answers this). */
export const quoteSchema = z.object({
  id: z.int(),
  orderId: z.int(),
  /** Revision number within the order: 1, 2, … */
  number: z.int(),
  /** Printed reference, e.g. "2026-0001-Q2". */
  reference: z.string(),
  currency: z.string(),
  lines: z.array(quoteLineSchema),
  subtotal: z.number(),
  delivery: z.number(),
  tax: z.number(),
  total: z.number(),
  depositRate: z.number(),
  depositDue: z.number(),
  validUntil: z.string(),
  terms: z.string(),
  cautions: z.array(z.string()),
  createdAt: z.string(),
  createdBy: z.nullable(z.string()),
  sentAt: z.nullable(z.string()),
  sentTo: z.nullable(z.string()),
  superseded: z.boolean(),
});
export type Quote = z.infer<typeof quoteSchema>;

/** `GET /api/dev/mail`: what the local SMTP fake holds. */
export const mailMessageSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  attachments: z.array(
    z.object({ filename: z.string(), contentType: z.string(), size: z.number() }),
  ),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;

/** `GET /api/jobs/:id/files` rows. */
export const storedFileSchema = z.object({
  id: z.int(),
  jobId: z.int(),
  name: z.string(),
  contentType: z.enum(['application/pdf', 'image/png', 'image/jpeg']),
  size: z.int(),
  uploadedBy: z.nullable(z.string()),
  createdAt: z.string(),
  /** Whether the signed-in user may delete it (the server's policy decides). */
  canDelete: z.boolean(),
});
export type StoredFile = z.infer<typeof storedFileSchema>;
export const MAX_UPLOAD_BYTES = 25 * 1024 * 1024;
/** The refusal of any plan type other than PDF, PNG or JPEG (`415 unsupported_type`). */
export const UNSUPPORTED_PLAN_TYPE_MESSAGE = 'Upload a PDF, PNG or JPEG plan';
/** The refusal of a plan over {@link MAX_UPLOAD_BYTES} (`413 too_large`). */
export const PLAN_TOO_LARGE_MESSAGE =
  'The plan is larger than 25 MB. Upload a file of at most 25 MB.';
