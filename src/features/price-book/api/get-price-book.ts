import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { priceBookSchema } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { priceBookKeys } from './keys';

/**
 * The answer of `GET`/`PUT /api/price-book`: the book, `demo` while it is invented defaults, and
 * when and by whom it was last saved (null until it is).
 */
export const storedPriceBookSchema = z.object({
  ...priceBookSchema.shape,
  demo: z.boolean().default(false),
  updatedAt: z.string().nullable().default(null),
  updatedBy: z.string().nullable().default(null),
});
/** A price book as the server answers it. */
export type StoredPriceBook = z.infer<typeof storedPriceBookSchema>;

/** `GET /api/price-book` query options. */
export const priceBookQueryOptions = () =>
  queryOptions({
    queryKey: priceBookKeys.current(),
    queryFn: ({ signal }) =>
      api.request('/api/price-book', { schema: storedPriceBookSchema, signal }),
  });

/** The plant's price book. */
export function usePriceBook() {
  return useQuery(priceBookQueryOptions());
}
