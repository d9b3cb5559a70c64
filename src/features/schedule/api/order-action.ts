import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderSchema, type OrderDetail } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';
import { scheduleKeys } from './keys';

/** `POST /api/orders/:id/<path>`: one production change of an order; answers the order page. */
export function postOrderAction(orderId: number, path: string, body: object): Promise<OrderDetail> {
  return api.request(`/api/orders/${orderId}/${path}`, {
    method: 'POST',
    body,
    schema: orderSchema,
  });
}

/**
 * A production change as a mutation. Success puts the answered order in the cache; success or
 * failure (a 409 `stale` included) refetches the order, the lists and the board, so the next try
 * carries the current version.
 */
export function useOrderAction<B>(
  orderId: number,
  send: (orderId: number, body: B) => Promise<OrderDetail>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: B) => send(orderId, body),
    onSuccess: (order) => queryClient.setQueryData(orderKeys.detail(orderId), order),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: scheduleKeys.all }),
      ]),
  });
}
