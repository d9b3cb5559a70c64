import { z } from 'zod';

const load = (label: string) =>
  z
    .number({ message: `${label} must be a number` })
    .min(0, `${label} cannot be negative`)
    .max(500, `${label} looks too large`);

/**
 * A site's design criteria, in the plant's units (psf for imperial plants, kPa for metric).
 * `loads` override the plant's defaults for this job only.
 */
export const designCriteriaSchema = z.object({
  groundSnow: load('Ground snow load').nullable().optional(),
  windUplift: load('Wind uplift').nullable().optional(),
  exposureNotes: z.string().trim().max(1000, 'Use at most 1000 characters').nullable().optional(),
  loads: z
    .object({
      tcll: load('TCLL').optional(),
      tcdl: load('TCDL').optional(),
      bcll: load('BCLL').optional(),
      bcdl: load('BCDL').optional(),
    })
    .optional(),
});
export type DesignCriteria = z.infer<typeof designCriteriaSchema>;

const jobFields = z.object({
  name: z.string().trim().min(1, 'Enter a job name').max(160, 'Use at most 160 characters'),
  address: z
    .string()
    .trim()
    .min(1, 'Enter the site address')
    .max(400, 'Use at most 400 characters'),
  planRevision: z.string().trim().max(40, 'Use at most 40 characters').nullable().optional(),
  criteria: designCriteriaSchema,
});

/** Body of `POST /api/customers/:id/jobs`. */
export const createJobSchema = jobFields.extend({ criteria: designCriteriaSchema.default({}) });
export type CreateJobInput = z.infer<typeof createJobSchema>;

/** Body of `PATCH /api/jobs/:id`. */
// No defaults here: a field left out of a PATCH stays as it is.
export const updateJobSchema = jobFields
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateJobInput = z.infer<typeof updateJobSchema>;

/** Area loads in the plant's units. */
export const areaLoadsSchema = z.object({
  tcll: z.number(),
  tcdl: z.number(),
  bcll: z.number(),
  bcdl: z.number(),
});
export type AreaLoads = z.infer<typeof areaLoadsSchema>;

export const jobSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  address: z.string(),
  planRevision: z.string().nullable(),
  customer: z.object({ id: z.number().int(), name: z.string() }),
  criteria: designCriteriaSchema,
  /** The plant defaults with this job's overrides applied: what a new truss line starts from. */
  effectiveLoads: areaLoadsSchema,
  units: z.enum(['imperial', 'metric']),
  orders: z.array(
    z.object({
      id: z.number().int(),
      number: z.string(),
      status: z.string(),
      lineCount: z.number().int(),
    }),
  ),
  createdAt: z.string(),
});
export type JobDetail = z.infer<typeof jobSchema>;
