import { queryOptions, useQuery } from '@tanstack/react-query';
import { shopPaperIndexSchema } from '../../../../shared/api/shopPaper';
import { api } from '../../../lib/api-client';
import { shopPaperKeys } from './keys';

/** `GET /api/orders/:id/shop-paper`: the order and its marks (409 until all are approved). */
export const shopPaperIndexQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: shopPaperKeys.index(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/shop-paper`, { schema: shopPaperIndexSchema, signal }),
    retry: false,
  });

/** What there is to print for an order. */
export const useShopPaperIndex = (orderId: number) => useQuery(shopPaperIndexQueryOptions(orderId));
