import { useMutation, useQueryClient } from '@tanstack/react-query';
import { quoteSchema, type Quote } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';
import { quoteKeys } from './keys';

/** `POST /api/orders/:id/quotes` → 201 Quote; 409 (naming the marks) while a design fails. */
export function createQuote(orderId: number): Promise<Quote> {
  return api.request(`/api/orders/${orderId}/quotes`, { method: 'POST', schema: quoteSchema });
}

/**
 * Makes a new revision. The order's revisions refetch (the older ones become superseded) and so
 * does the order, whose status moves to quoted.
 */
export function useCreateQuote(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => createQuote(orderId),
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(orderId, quote.number), quote);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: quoteKeys.list(orderId) }),
        queryClient.invalidateQueries({ queryKey: quoteKeys.details() }),
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
      ]);
    },
  });
}
