// zod/mini: the portal's lists load these on a builder's phone (see shared/api/auth.ts).
import * as z from 'zod/mini';

/** Query of every paged list endpoint. */
export const listQuerySchema = z.object({
  q: z.optional(z.string().check(z.trim(), z.maxLength(100, 'Use at most 100 characters'))),
  page: z._default(
    z.coerce
      .number({ error: 'Pages are numbered' })
      .check(z.int('Pages are numbered'), z.minimum(1, 'Pages start at 1')),
    1,
  ),
  pageSize: z._default(
    z.coerce
      .number({ error: 'Say how many per page' })
      .check(
        z.int('Say how many per page'),
        z.minimum(1, 'At least 1 per page'),
        z.maximum(100, 'At most 100 per page'),
      ),
    25,
  ),
  sort: z.optional(
    z.string().check(z.regex(/^-?[a-zA-Z]+$/, 'Sort by a column name, with - for descending')),
  ),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

/** `{ items, total, page, pageSize }`. */
export const pageOf = <T extends z.core.SomeType>(item: T) =>
  z.object({
    items: z.array(item),
    total: z.int(),
    page: z.int(),
    pageSize: z.int(),
  });

export const customerSummarySchema = z.object({
  id: z.int(),
  name: z.string(),
  email: z.string(),
  phone: z.nullable(z.string()),
  terms: z.enum(['account', 'deposit']),
  city: z.nullable(z.string()),
  jobCount: z.int(),
});
export type CustomerSummary = z.infer<typeof customerSummarySchema>;

export const jobSummarySchema = z.object({
  id: z.int(),
  name: z.string(),
  address: z.string(),
  customerId: z.int(),
  customerName: z.string(),
  planRevision: z.nullable(z.string()),
  createdAt: z.string(),
});
export type JobSummary = z.infer<typeof jobSummarySchema>;
