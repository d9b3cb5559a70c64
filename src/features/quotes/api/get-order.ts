import { queryOptions, useQuery } from '@tanstack/react-query';
import { orderSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';

/** `GET /api/orders/:id`: the order being quoted (number, builder, job, status). */
export const orderQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: orderKeys.detail(orderId),
    queryFn: ({ signal }) => api.request(`/api/orders/${orderId}`, { schema: orderSchema, signal }),
  });

/** One order. */
export function useOrder(orderId: number) {
  return useQuery(orderQueryOptions(orderId));
}
