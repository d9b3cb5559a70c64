import { z } from 'zod';

/** Figures of one plan: boards, cost, waste. */
const figuresSchema = z.object({
  boardCount: z.number(),
  totalCost: z.number(),
  wastePercent: z.number(),
});

/** One lumber's plan as `GET /api/shop/orders/:id/lumber-plan` answers it (lengths in inches). */
export const lumberPlanSectionSchema = z.object({
  lumber: z.string(),
  /** The stock entry used ("2x4" for every 2x4 grade, or the lumber itself). */
  stockFrom: z.string().nullable(),
  pieceCount: z.number(),
  error: z.object({ code: z.string(), message: z.string() }).nullable(),
  plan: figuresSchema
    .extend({
      boardFeet: z.number(),
      lowerBound: z.number(),
      gapPercent: z.number(),
      optimal: z.boolean(),
      firstFitDecreasing: figuresSchema.nullable(),
      byStock: z.array(z.object({ lengthFt: z.number(), price: z.number(), count: z.number() })),
      boards: z.array(
        z.object({
          lengthFt: z.number(),
          /** Boards cut alike (same stock, same pieces). */
          count: z.number(),
          pieces: z.array(z.object({ mark: z.string(), lengthIn: z.number() })),
          offcutIn: z.number(),
        }),
      ),
    })
    .nullable(),
});

export const lumberPlanSchema = z.object({
  orderId: z.number(),
  orderNumber: z.string(),
  engineVersion: z.string(),
  demoStock: z.boolean(),
  kerfIn: z.number(),
  trimIn: z.number(),
  sections: z.array(lumberPlanSectionSchema),
  totals: z.object({
    boardCount: z.number(),
    totalCost: z.number(),
    lowerBound: z.number(),
    gapPercent: z.number(),
    firstFitDecreasingCost: z.number().nullable(),
  }),
  cautions: z.array(z.string()),
});

export type LumberPlanSection = z.infer<typeof lumberPlanSectionSchema>;
export type LumberPlanBody = z.infer<typeof lumberPlanSchema>;
