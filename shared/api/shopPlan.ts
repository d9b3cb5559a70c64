import { z } from 'zod';
import { lumberPlanSchema } from './lumberPlan';
import type { CutListView, ShopOrder } from './shop';

/** The run that makes an order's next shop plan: none, waiting for the job queue, running, failed. */
export const SHOP_PLAN_RUN_STATES = ['idle', 'queued', 'running', 'failed'] as const;
export type ShopPlanRunState = (typeof SHOP_PLAN_RUN_STATES)[number];

/**
 * Where a running plan is: cutting the pieces, planning lumber n of N (solver stage, rounds and,
 * inside the solve, integer-phase steps and the gap to the lower bound).
 */
export const shopPlanProgressSchema = z.object({
  stage: z.enum(['cutting', 'planning', 'storing']),
  lumber: z.string().nullable(),
  section: z.number(),
  sections: z.number(),
  /** The cutting-stock solver's stage for that lumber, and its column-generation rounds. */
  solverStage: z.string().nullable(),
  iterations: z.number(),
  /** Rounds of column generation of the lumbers planned so far. */
  totalIterations: z.number(),
  /** Inside the solve: integer-phase steps so far (each dive step, then the whole-board search). */
  steps: z.number().default(0),
  /** Pieces of this lumber in all, and those the integer phase has still to place. */
  pieces: z.number().default(0),
  piecesLeft: z.number().nullable().default(null),
  /** How far the best whole plan so far is above the lower bound so far, in % (null: unknown). */
  gapPercent: z.number().nullable().default(null),
});
export type ShopPlanProgress = z.infer<typeof shopPlanProgressSchema>;

/** Why a stored plan no longer matches the order. */
export const OUT_OF_DATE_REASONS = ['designs', 'stock', 'engine'] as const;
export type OutOfDateReason = (typeof OUT_OF_DATE_REASONS)[number];

/** Each reason in words, as the pages and printouts say it. */
export const OUT_OF_DATE_WORDS: Record<OutOfDateReason, string> = {
  designs: 'the order’s designs changed',
  stock: 'the stock settings changed',
  engine: 'the engine was updated',
};

/** "This plan was made before … Re-plan before cutting." (empty when current). */
export const outOfDateText = (reasons: readonly OutOfDateReason[]) =>
  reasons.length === 0
    ? ''
    : `This plan was made before ${reasons.map((r) => OUT_OF_DATE_WORDS[r]).join(' and ')}. Re-plan before cutting.`;

/** The run that makes the next plan, as every stored-plan page shows it. */
export const shopPlanRunSchema = z.object({
  state: z.enum(SHOP_PLAN_RUN_STATES),
  progress: shopPlanProgressSchema.nullable(),
  error: z.string().nullable(),
  requestedAt: z.string().nullable(),
});

/** What the cut-list and lumber-plan pages share: the stored plan's age, currency and run. */
const storedPlanShape = {
  madeAt: z.string().nullable(),
  /** Engine version that made the stored plan (null until the first run finishes). */
  engineVersion: z.string().nullable(),
  /** Empty when current; else what changed since it was made. */
  outOfDate: z.array(z.enum(OUT_OF_DATE_REASONS)),
  run: shopPlanRunSchema,
};
export type StoredPlanState = z.infer<z.ZodObject<typeof storedPlanShape>>;

/** `GET /api/shop/orders/:id/lumber-plan`: the stored plan, whether it is current, and its run. */
export const shopPlanStatusSchema = z.object({
  orderId: z.number(),
  orderNumber: z.string(),
  /** The stored lumber plan (null until the first run finishes). */
  plan: lumberPlanSchema.nullable(),
  ...storedPlanShape,
});
export type ShopPlanStatus = z.infer<typeof shopPlanStatusSchema>;

/** `GET /api/shop/orders/:id/cut-list`: the order, its stored cut list (or none yet) and the run. */
export const cutListStatusSchema = z.object({
  order: z.custom<ShopOrder>((v) => typeof v === 'object' && v !== null),
  /** The stored cut list (null until the first run finishes). */
  cutList: z.custom<CutListView>((v) => typeof v === 'object' && v !== null).nullable(),
  ...storedPlanShape,
});
export type CutListStatus = z.infer<typeof cutListStatusSchema>;
