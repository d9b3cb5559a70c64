import { queryOptions, useQuery } from '@tanstack/react-query';
import { quoteSchema } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { quoteKeys } from './keys';

/** `GET /api/orders/:id/quotes/:number`: one revision. */
export const quoteQueryOptions = (orderId: number, number: number) =>
  queryOptions({
    queryKey: quoteKeys.detail(orderId, number),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/quotes/${number}`, { schema: quoteSchema, signal }),
  });

/** One quote revision. */
export function useQuote(orderId: number, number: number) {
  return useQuery(quoteQueryOptions(orderId, number));
}
