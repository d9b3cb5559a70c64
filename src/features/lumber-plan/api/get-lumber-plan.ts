import { queryOptions, useQuery } from '@tanstack/react-query';
import { lumberPlanSchema } from '../../../../shared/api/lumberPlan';
import { api } from '../../../lib/api-client';
import { lumberPlanKeys } from './keys';

/** Where the printable and spreadsheet copies of an order's plan are. */
export const lumberPlanFiles = (orderId: number) => ({
  pdf: `/api/shop/orders/${orderId}/lumber-plan.pdf`,
  csv: `/api/shop/orders/${orderId}/lumber-plan.csv`,
});

/** `GET /api/shop/orders/:id/lumber-plan` query options. */
export const lumberPlanQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: lumberPlanKeys.order(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/shop/orders/${orderId}/lumber-plan`, { schema: lumberPlanSchema, signal }),
    staleTime: 60_000,
  });

/** The order's lumber plan (computed by the server from the approved designs). */
export function useLumberPlan(orderId: number) {
  return useQuery(lumberPlanQueryOptions(orderId));
}
