import { z } from 'zod';
import { areaLoadsSchema } from './jobs';

/**
 * The plant's design rules: engine options every design the plant runs uses (preview, save,
 * review, quote). `amplifyPanelPointMoment`: check a chord's panel-point moment with the NDS 2018
 * §3.9.2 amplifier too (stricter than common practice, which checks it unamplified). Default off.
 */
export const designRulesSchema = z.object({
  amplifyPanelPointMoment: z.boolean({ error: 'Amplified panel-point moment must be on or off' }),
});
export type DesignRules = z.infer<typeof designRulesSchema>;

/** Rules of a plant that has never set any: common practice. */
export const DEFAULT_DESIGN_RULES: DesignRules = { amplifyPanelPointMoment: false };

/** `PUT /api/plant/design-rules`: the rules and the version the manager saw (409 when stale). */
export const updateDesignRulesSchema = designRulesSchema.extend({
  version: z.number({ error: 'Send the version you saw' }).int().min(0),
});
export type UpdateDesignRulesInput = z.infer<typeof updateDesignRulesSchema>;

/** `GET /api/plant/design-rules`: the rules and their version. */
export const designRulesDetailSchema = designRulesSchema.extend({ version: z.number().int() });
export type DesignRulesDetail = z.infer<typeof designRulesDetailSchema>;

/** `GET /api/plant`: the plant, its units and the default design loads (in the plant's units). */
export const plantSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  units: z.enum(['imperial', 'metric']),
  demo: z.boolean(),
  address: z.string().nullable(),
  defaultLoads: areaLoadsSchema,
  /** The engine options every design of the plant uses. */
  designRules: designRulesSchema,
});
export type PlantDetail = z.infer<typeof plantSchema>;
