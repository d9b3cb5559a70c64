import { queryOptions, useQuery } from '@tanstack/react-query';
import { builderQuoteSchema } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `GET /api/orders/:id/quotes/:number`: a sent revision, builder-shaped. */
export const builderQuoteQueryOptions = (orderId: number, number: number) =>
  queryOptions({
    queryKey: portalKeys.quote(orderId, number),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/quotes/${number}`, {
        schema: builderQuoteSchema,
        signal,
      }),
  });

export const useBuilderQuote = (orderId: number, number: number) =>
  useQuery(builderQuoteQueryOptions(orderId, number));
