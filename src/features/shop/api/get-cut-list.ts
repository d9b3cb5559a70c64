import { queryOptions, useQuery } from '@tanstack/react-query';
import { cutListStatusSchema, type CutListStatus } from '../../../../shared/api/shopPlan';
import { api } from '../../../lib/api-client';
import { shopKeys } from '../../../lib/query-keys';

/** Where the stored cut list's exports live (plain links: the browser downloads or opens them). */
export const cutListUrl = (orderId: number, format: 'csv' | 'pdf') =>
  `/api/shop/orders/${orderId}/cut-list.${format}`;

/** A plan being made is asked after every second, so its progress moves on screen. */
const busy = (s: CutListStatus | undefined) =>
  s?.run.state === 'queued' || s?.run.state === 'running';

/** `GET /api/shop/orders/:id/cut-list`: the order's stored cut list (made by the shop-plan job) and its run. */
export const cutListQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: shopKeys.cutList(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/shop/orders/${orderId}/cut-list`, { schema: cutListStatusSchema, signal }),
    refetchInterval: (query) => (busy(query.state.data) ? 1000 : false),
  });

/** One order's stored cut list and the run making the next. */
export function useCutList(orderId: number) {
  return useQuery(cutListQueryOptions(orderId));
}
