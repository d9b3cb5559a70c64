import { useMutation, useQueryClient } from '@tanstack/react-query';
import { paymentSummarySchema, type OfflinePaymentInput } from '../../../../shared/api/portal';
import { api, isApiError } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';

/**
 * `POST /api/orders/:id/payments { amount, method, reference, version }` → 201 the payment.
 * The order (payments, balance, status) and its mail (the receipt) refetch; so does a stale order.
 */
export function useRecordPayment(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OfflinePaymentInput) =>
      api.request(`/api/orders/${orderId}/payments`, {
        method: 'POST',
        body: input,
        schema: paymentSummarySchema,
      }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) }),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
      ]),
    // 409: someone else recorded money meanwhile; show what they recorded.
    onError: (error) =>
      isApiError(error) && error.status === 409
        ? queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId) })
        : undefined,
  });
}
