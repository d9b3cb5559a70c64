import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { lineSchema, orderSchema, type OrderDetail } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { jobKeys, orderKeys, reviewKeys } from '../../../lib/query-keys';

/** `GET /api/orders/:id` query options (lines and history included). */
export const orderQueryOptions = (id: number) =>
  queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => api.request(`/api/orders/${id}`, { schema: orderSchema, signal }),
  });

/** One order with its truss lines and history. */
export function useOrder(id: number) {
  return useQuery(orderQueryOptions(id));
}

/** `POST /api/orders { jobId }` → 201 OrderDetail. */
export function createOrder(jobId: number): Promise<OrderDetail> {
  return api.request('/api/orders', { method: 'POST', body: { jobId }, schema: orderSchema });
}

/** Starts an order for a job; order lists and the job (its orders) refetch. */
export function useCreateOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createOrder,
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: jobKeys.detail(order.job.id) }),
      ]);
    },
  });
}

/** Refetches what a change to an order's lines touches: the order, order lists, the review queue. */
function invalidateOrder(queryClient: ReturnType<typeof useQueryClient>, orderId: number) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
    queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
    queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  ]);
}

/** `POST /api/orders/:id/lines/:lineId/copy` → 201 LineDetail (the copy goes last). */
export function useCopyLine(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lineId: number) =>
      api.request(`/api/orders/${orderId}/lines/${lineId}/copy`, {
        method: 'POST',
        schema: lineSchema,
      }),
    onSuccess: () => invalidateOrder(queryClient, orderId),
  });
}

/** `DELETE /api/orders/:id/lines/:lineId` → 204. */
export function useDeleteLine(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lineId: number) =>
      api.request<void>(`/api/orders/${orderId}/lines/${lineId}`, { method: 'DELETE' }),
    onSuccess: (_done, lineId) => {
      queryClient.removeQueries({ queryKey: orderKeys.line(orderId, lineId) });
      return invalidateOrder(queryClient, orderId);
    },
  });
}

/** `POST /api/orders/:id/lines/reorder { lineIds }` → OrderDetail, which replaces the cached order. */
export function useReorderLines(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lineIds: number[]) =>
      api.request(`/api/orders/${orderId}/lines/reorder`, {
        method: 'POST',
        body: { lineIds },
        schema: orderSchema,
      }),
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(orderId), order);
      return queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    },
  });
}
