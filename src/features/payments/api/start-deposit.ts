import { useMutation } from '@tanstack/react-query';
import { depositSessionSchema } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';

/** `POST /api/orders/:id/deposit` → 201 { url, amount, currency, sessionId }. */
export function useStartDeposit(orderId: number) {
  return useMutation({
    mutationFn: () =>
      api.request(`/api/orders/${orderId}/deposit`, {
        method: 'POST',
        schema: depositSessionSchema,
      }),
  });
}
