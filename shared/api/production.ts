import { z } from 'zod';

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-03-01');
const positive = (what: string, max: number) =>
  z
    .number({ message: `${what} must be a number` })
    .positive(`${what} must be above 0`)
    .max(max);
const nonNegative = (what: string, max: number) =>
  z
    .number({ message: `${what} must be a number` })
    .min(0, `${what} cannot be negative`)
    .max(max);

export const productionTableSchema = z.object({
  id: z.number().int().positive(),
  name: z.string().trim().min(1, 'Name the table').max(40),
  crew: z.number().int().min(1, 'At least 1 person').max(20),
  shifts: z.number().int().min(1, 'At least 1 shift').max(3),
  hoursPerShift: positive('Hours per shift', 12),
});
export type ProductionTable = z.infer<typeof productionTableSchema>;

/** The plant's production settings (admin): tables, working days, closures, labour model. */
export const productionSettingsSchema = z
  .object({
    tables: z.array(productionTableSchema).min(1, 'Add at least one table').max(20),
    /** 0 = Sunday … 6 = Saturday. */
    workingDays: z.array(z.number().int().min(0).max(6)).min(1, 'Pick at least one working day'),
    closures: z.array(isoDate).max(200),
    setupMinutes: nonNegative('Set-up minutes', 600),
    labour: z.object({
      perTruss: nonNegative('Minutes per truss', 600),
      perPiece: nonNegative('Minutes per piece', 60),
      perJoint: nonNegative('Minutes per joint', 60),
      perPlate: nonNegative('Minutes per plate', 60),
      factor: positive('Calibration factor', 10),
    }),
    horizonDays: z.number().int().min(7).max(365),
  })
  .refine((s) => new Set(s.tables.map((t) => t.id)).size === s.tables.length, {
    message: 'Each table needs its own id',
    path: ['tables'],
  });
export type ProductionSettings = z.infer<typeof productionSettingsSchema>;

export const productionSettingsResponseSchema = z.object({
  settings: productionSettingsSchema,
  /** True while the plant has saved none (these are the invented demo defaults). */
  demo: z.boolean(),
  updatedAt: z.string().nullable(),
});

const reason = z.string().trim().min(3, 'Give a reason').max(500);

/** The order's `version` the user saw; a newer order answers 409 `stale` and changes nothing. */
const seenVersion = z
  .number({ message: 'Reload the order: send the version you looked at' })
  .int()
  .positive();

/** Body of `POST /api/orders/:id/promised-date`; a change of an existing date needs a reason. */
export const promisedDateSchema = z.object({
  promisedOn: isoDate,
  reason: z.string().trim().max(500).default(''),
  version: seenVersion,
});
export type PromisedDateInput = z.input<typeof promisedDateSchema>;
/** Body of `POST /api/orders/:id/hold` and `/release` (plant manager). */
export const holdSchema = z.object({ reason, version: seenVersion });
export type HoldInput = z.input<typeof holdSchema>;

/** Body of `POST /api/orders/:id/delivery`: who received the trusses, when, and a note. */
export const deliverySchema = z.object({
  receivedBy: z.string().trim().min(2, 'Who signed for the delivery?').max(120),
  /** When the builder received them (ISO date-time); now when left out. */
  receivedAt: z.iso
    .datetime({ offset: true, local: true, message: 'Use a date and time' })
    .optional(),
  note: z.string().trim().max(1000).default(''),
  version: seenVersion,
});
export type DeliveryInput = z.input<typeof deliverySchema>;

/** Body of `POST /api/schedule/moves`: pin an order to start on this table and day. */
export const moveSchema = z.object({
  orderId: z.number().int().positive(),
  tableId: z.number().int().positive(),
  date: isoDate,
});

export const scheduleQuerySchema = z.object({
  from: isoDate.optional(),
  days: z.coerce.number().int().min(1).max(120).default(14),
});

export const scheduleBlockSchema = z.object({
  orderId: z.number().int(),
  number: z.string(),
  customer: z.string(),
  tableId: z.number().int(),
  date: z.string(),
  minutes: z.number(),
  trusses: z.number().int(),
  marks: z.array(z.string()),
  pinned: z.boolean(),
});
export type ScheduleBlock = z.infer<typeof scheduleBlockSchema>;

export const scheduleOrderSchema = z.object({
  id: z.number().int(),
  number: z.string(),
  customer: z.string(),
  status: z.string(),
  promisedOn: z.string().nullable(),
  plannedFinishOn: z.string().nullable(),
  late: z.boolean(),
  minutes: z.number(),
  version: z.number().int().default(1),
});

/** An order ready to go out (every truss banded): the foreman signs off its delivery. */
export const readyOrderSchema = z.object({
  id: z.number().int(),
  number: z.string(),
  customer: z.string(),
  promisedOn: z.string().nullable(),
  /** Every truss loaded: the delivery can be signed off. */
  loaded: z.boolean(),
  version: z.number().int(),
});
export type ReadyOrder = z.infer<typeof readyOrderSchema>;

/** An order the plant manager holds: off the schedule until released, with the reason. */
export const heldOrderSchema = z.object({
  id: z.number().int(),
  number: z.string(),
  customer: z.string(),
  status: z.string(),
  promisedOn: z.string().nullable(),
  holdReason: z.string().nullable(),
  version: z.number().int(),
});
export type HeldOrder = z.infer<typeof heldOrderSchema>;

export const scheduleSchema = z.object({
  from: z.string(),
  days: z.array(z.string()),
  tables: z.array(productionTableSchema.extend({ capacity: z.number() })),
  load: z.array(
    z.object({ tableId: z.number(), date: z.string(), used: z.number(), capacity: z.number() }),
  ),
  blocks: z.array(scheduleBlockSchema),
  orders: z.array(scheduleOrderSchema),
  ready: z.array(readyOrderSchema).default([]),
  held: z.array(heldOrderSchema).default([]),
});
export type Schedule = z.infer<typeof scheduleSchema>;

export const STAGES = ['cut', 'assembled', 'banded', 'loaded', 'delivered'] as const;
export type Stage = (typeof STAGES)[number];

/** Body of `POST /api/floor/progress`: one tap on the floor, sent once or replayed. */
export const progressSchema = z.object({
  clientId: z.uuid('Send the change’s client id (a UUID)'),
  lineId: z.number().int().positive(),
  stage: z.enum(STAGES, { message: 'Stage is one of cut, assembled, banded, loaded, delivered' }),
  delta: z
    .number()
    .int()
    .min(-999)
    .max(999)
    .refine((d) => d !== 0, 'Change the count by at least 1'),
});
export type ProgressInput = z.infer<typeof progressSchema>;

export const floorLineSchema = z.object({
  lineId: z.number().int(),
  orderId: z.number().int(),
  orderNumber: z.string(),
  customer: z.string(),
  mark: z.string(),
  description: z.string(),
  quantity: z.number().int(),
  plannedToday: z.number().int(),
  counts: z.record(z.enum(STAGES), z.number().int()),
});
export type FloorLine = z.infer<typeof floorLineSchema>;

export const floorDaySchema = z.object({
  date: z.string(),
  tables: z.array(
    z.object({ id: z.number().int(), name: z.string(), lines: z.array(floorLineSchema) }),
  ),
});
export type FloorDay = z.infer<typeof floorDaySchema>;

/** ANSI/TPI 1 chapter 3 inspection checks (the record's check list). */
export const INSPECTION_CHECKS = [
  'dimensions',
  'lumberGrade',
  'platePosition',
  'plateEmbedment',
  'gaps',
] as const;
export const inspectionSchema = z.object({
  tableId: z.number().int().positive(),
  lineId: z.number().int().positive().nullable().default(null),
  truss: z.string().trim().min(1, 'Name the truss inspected').max(60),
  checks: z.object(
    Object.fromEntries(INSPECTION_CHECKS.map((c) => [c, z.boolean()])) as Record<
      (typeof INSPECTION_CHECKS)[number],
      z.ZodBoolean
    >,
  ),
  notes: z.string().trim().max(1000).default(''),
});
export type InspectionInput = z.infer<typeof inspectionSchema>;
