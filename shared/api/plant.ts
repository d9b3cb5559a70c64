import { z } from 'zod';
import { areaLoadsSchema } from './jobs';

/** `GET /api/plant`: the plant, its units and the default design loads (in the plant's units). */
export const plantSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  units: z.enum(['imperial', 'metric']),
  demo: z.boolean(),
  address: z.string().nullable(),
  defaultLoads: areaLoadsSchema,
});
export type PlantDetail = z.infer<typeof plantSchema>;
