import { useMutation, useQueryClient } from '@tanstack/react-query';
import { orderSchema } from '../../../../shared/api/orders';
import type { RequestChangesInput } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `POST /api/orders/:id/quotes/:number/changes { message }`: a message to the desk. */
export function useRequestChanges(orderId: number, number: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: RequestChangesInput) =>
      api.request(`/api/orders/${orderId}/quotes/${number}/changes`, {
        method: 'POST',
        body,
        schema: orderSchema,
      }),
    onSuccess: () => void qc.invalidateQueries({ queryKey: portalKeys.order(orderId) }),
  });
}
