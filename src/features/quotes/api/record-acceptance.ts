import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderSchema } from '../../../../shared/api/orders';
import type { AcceptQuoteInput } from '../../../../shared/api/portal';
import { api, isApiError } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';
import { quoteKeys } from './keys';

/**
 * `POST /api/orders/:id/quotes/:number/accept { name, agree, method, note, version }` by the desk:
 * the builder accepted by phone, on paper or by e-mail, and sales records it for them. The order
 * (now accepted) replaces the cached one; a 409 (the order changed meanwhile) refetches it.
 */
export function useRecordAcceptance(orderId: number) {
  const queryClient = useQueryClient();
  const refresh = () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
      queryClient.invalidateQueries({ queryKey: quoteKeys.list(orderId) }),
    ]);
  return useMutation({
    mutationFn: ({ number, ...body }: AcceptQuoteInput & { number: number }) =>
      api.request(`/api/orders/${orderId}/quotes/${number}/accept`, {
        method: 'POST',
        body,
        schema: orderSchema,
      }),
    onSuccess: (order) => {
      queryClient.setQueryData(orderKeys.detail(orderId), order);
      return Promise.all([
        refresh(),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
      ]);
    },
    onError: (error) => (isApiError(error) && error.status === 409 ? refresh() : undefined),
  });
}
