import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderSchema } from '../../../../shared/api/orders';
import type { AcceptQuoteInput } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `POST /api/orders/:id/quotes/:number/accept { name, agree }` → the order, accepted. */
export function useAcceptQuote(orderId: number, number: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptQuoteInput) =>
      api.request(`/api/orders/${orderId}/quotes/${number}/accept`, {
        method: 'POST',
        body,
        schema: orderSchema,
      }),
    onSuccess: (order) => {
      qc.setQueryData(portalKeys.order(orderId), order);
      void qc.invalidateQueries({ queryKey: portalKeys.all });
    },
  });
}
