import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShopOrder } from '../../../../shared/api/shop';
import { api } from '../../../lib/api-client';
import { shopKeys } from '../../../lib/query-keys';

/** `GET /api/shop/orders`: the plant's orders whose designs are all approved. */
export const shopOrdersQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.orders(),
    queryFn: ({ signal }) => api.request<{ items: ShopOrder[] }>('/api/shop/orders', { signal }),
  });

/** Orders ready for the shop. */
export function useShopOrders() {
  return useQuery(shopOrdersQueryOptions());
}
