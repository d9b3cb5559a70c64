import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cutListStatusSchema } from '../../../../shared/api/shopPlan';
import { api } from '../../../lib/api-client';
import { shopKeys } from '../../../lib/query-keys';

/** `POST /api/shop/orders/:id/cut-list/replan` → the cut list's status with its run queued. */
export const replanCutList = (orderId: number) =>
  api.request(`/api/shop/orders/${orderId}/cut-list/replan`, {
    method: 'POST',
    schema: cutListStatusSchema,
  });

/** Asks for a new plan (cut list and lumber plan); the answer replaces the cached status, which then polls. */
export function useReplanCutList(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => replanCutList(orderId),
    onSuccess: (status) => queryClient.setQueryData(shopKeys.cutList(orderId), status),
  });
}
