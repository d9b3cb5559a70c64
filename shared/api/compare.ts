import { z } from 'zod';
import { PROFILE_KINDS } from './design';

/** One profile of `POST /api/designs/compare`: designed with the same span, pitch, heels and loads. */
export const profileComparisonSchema = z.object({
  profile: z.enum(PROFILE_KINDS),
  /** False when the geometry cannot be built as this profile; `message` says why. */
  fits: z.boolean(),
  message: z.string().nullable(),
  ok: z.boolean(),
  maxCsi: z.number().nullable(),
  /** Board feet bought per truss (stock lengths), all plies. */
  boardFeet: z.number().nullable(),
  /** Plates per truss, both faces, all plies. */
  plates: z.number().int().nullable(),
  pieces: z.number().int().nullable(),
  /** Estimated selling price of one truss from the price book; null for roles without prices. */
  unitPrice: z.number().nullable(),
  currency: z.string().nullable(),
  /** Estimated weight of one truss in the request's units (lb or kg). */
  weight: z.number().nullable(),
  description: z.string().nullable(),
});
export type ProfileComparison = z.infer<typeof profileComparisonSchema>;

export const profileComparisonsSchema = z.object({
  units: z.enum(['imperial', 'metric']),
  weightUnit: z.enum(['lb', 'kg']),
  demoPrices: z.boolean(),
  rows: z.array(profileComparisonSchema),
});
export type ProfileComparisons = z.infer<typeof profileComparisonsSchema>;
