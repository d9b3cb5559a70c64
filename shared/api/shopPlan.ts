import { z } from 'zod';
import { lumberPlanSchema } from './lumberPlan';

/** The run that makes an order's next shop plan: none, waiting for the job queue, running, failed. */
export const SHOP_PLAN_RUN_STATES = ['idle', 'queued', 'running', 'failed'] as const;
export type ShopPlanRunState = (typeof SHOP_PLAN_RUN_STATES)[number];

/** Where a running plan is: cutting the pieces, planning lumber n of N (solver stage, rounds). */
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
});
export type ShopPlanProgress = z.infer<typeof shopPlanProgressSchema>;

/** Why a stored plan no longer matches the order. */
export const OUT_OF_DATE_REASONS = ['designs', 'stock', 'engine'] as const;

/** `GET /api/shop/orders/:id/lumber-plan`: the stored plan, whether it is current, and its run. */
export const shopPlanStatusSchema = z.object({
  orderId: z.number(),
  orderNumber: z.string(),
  /** The stored lumber plan (null until the first run finishes). */
  plan: lumberPlanSchema.nullable(),
  madeAt: z.string().nullable(),
  /** Empty when current; else what changed since it was made. */
  outOfDate: z.array(z.enum(OUT_OF_DATE_REASONS)),
  run: z.object({
    state: z.enum(SHOP_PLAN_RUN_STATES),
    progress: shopPlanProgressSchema.nullable(),
    error: z.string().nullable(),
    requestedAt: z.string().nullable(),
  }),
});
export type ShopPlanStatus = z.infer<typeof shopPlanStatusSchema>;
