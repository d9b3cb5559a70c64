import { z } from 'zod';
import { listQuerySchema } from '../../../shared/api/list';
import { REVIEW_STATES } from '../../../shared/api/orders';

/** The reviewer's queue: pending lines by default. */
export const reviewQueueQuerySchema = z.object({
  ...listQuerySchema.shape,
  state: z.enum(REVIEW_STATES).default('pending'),
});
export type ReviewQueueQuery = z.infer<typeof reviewQueueQuerySchema>;
