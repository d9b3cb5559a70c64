import { queryOptions, useQuery } from '@tanstack/react-query';
import { shopPlanStatusSchema, type ShopPlanStatus } from '../../../../shared/api/shopPlan';
import { api } from '../../../lib/api-client';
import { lumberPlanKeys } from './keys';

/** Where the printable and spreadsheet copies of an order's plan are. */
export const lumberPlanFiles = (orderId: number) => ({
  pdf: `/api/shop/orders/${orderId}/lumber-plan.pdf`,
  csv: `/api/shop/orders/${orderId}/lumber-plan.csv`,
});

/** A plan being made is asked after every second, so its progress moves on screen. */
const busy = (s: ShopPlanStatus | undefined) =>
  s?.run.state === 'queued' || s?.run.state === 'running';

/** `GET /api/shop/orders/:id/lumber-plan` query options: the stored plan and its run. */
export const lumberPlanQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: lumberPlanKeys.order(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/shop/orders/${orderId}/lumber-plan`, {
        schema: shopPlanStatusSchema,
        signal,
      }),
    staleTime: 10_000,
    refetchInterval: (query) => (busy(query.state.data) ? 1000 : false),
  });

/** The order's stored lumber plan (made by the server's shop-plan job) and its run. */
export function useLumberPlan(orderId: number) {
  return useQuery(lumberPlanQueryOptions(orderId));
}
