import { z } from 'zod';
import { listQuerySchema } from '../../../shared/api/list';

export { createCustomerSchema, updateCustomerSchema } from '../../../shared/api/customers';
export { createJobSchema } from '../../../shared/api/jobs';

/** Builders table: paging, search, sort, and a terms filter. */
export const customerListQuerySchema = z.object({
  ...listQuerySchema.shape,
  terms: z.enum(['account', 'deposit']).optional(),
});
export type CustomerListQuery = z.infer<typeof customerListQuerySchema>;
