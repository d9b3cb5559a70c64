import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CutListView } from '../../../../shared/api/shop';
import { api } from '../../../lib/api-client';
import { shopKeys } from '../../../lib/query-keys';

/** Where the cut list's exports live (plain links: the browser downloads or opens them). */
export const cutListUrl = (orderId: number, format: 'csv' | 'pdf') =>
  `/api/shop/orders/${orderId}/cut-list.${format}`;

/** `GET /api/shop/orders/:id/cut-list`: the order's cut list, computed by the server's engine. */
export const cutListQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: shopKeys.cutList(orderId),
    queryFn: ({ signal }) =>
      api.request<CutListView>(`/api/shop/orders/${orderId}/cut-list`, { signal }),
  });

/** One order's cut list. */
export function useCutList(orderId: number) {
  return useQuery(cutListQueryOptions(orderId));
}
