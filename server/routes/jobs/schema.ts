import { z } from 'zod';
import { listQuerySchema } from '../../../shared/api/list';

export { updateJobSchema } from '../../../shared/api/jobs';

/** Jobs table: paging, search, sort, and a builder filter. */
export const jobListQuerySchema = z.object({
  ...listQuerySchema.shape,
  customerId: z.coerce.number().int().positive().optional(),
});
export type JobListQuery = z.infer<typeof jobListQuerySchema>;
