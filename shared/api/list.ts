import { z } from 'zod';

/** Query of every paged list endpoint. */
export const listQuerySchema = z.object({
  q: z.string().trim().max(100, 'Use at most 100 characters').optional(),
  page: z.coerce.number().int().min(1, 'Pages start at 1').default(1),
  pageSize: z.coerce
    .number()
    .int()
    .min(1, 'At least 1 per page')
    .max(100, 'At most 100 per page')
    .default(25),
  sort: z
    .string()
    .regex(/^-?[a-zA-Z]+$/, 'Sort by a column name, with - for descending')
    .optional(),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

/** `{ items, total, page, pageSize }`. */
export const pageOf = <T extends z.ZodTypeAny>(item: T) =>
  z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });

export const customerSummarySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  phone: z.string().nullable(),
  terms: z.enum(['account', 'deposit']),
  city: z.string().nullable(),
  jobCount: z.number().int(),
});
export type CustomerSummary = z.infer<typeof customerSummarySchema>;

export const jobSummarySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  address: z.string(),
  customerId: z.number().int(),
  customerName: z.string(),
  planRevision: z.string().nullable(),
  createdAt: z.string(),
});
export type JobSummary = z.infer<typeof jobSummarySchema>;
