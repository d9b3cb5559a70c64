import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { quoteSchema } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { quoteKeys } from './keys';

const quoteListSchema = z.object({ items: z.array(quoteSchema) });

/** `GET /api/orders/:id/quotes`: the order's revisions, newest first. */
export const quotesQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: quoteKeys.list(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/quotes`, { schema: quoteListSchema, signal }),
  });

/** The revisions of one order. */
export function useQuotes(orderId: number) {
  return useQuery(quotesQueryOptions(orderId));
}
