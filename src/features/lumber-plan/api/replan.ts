import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shopPlanStatusSchema } from '../../../../shared/api/shopPlan';
import { api } from '../../../lib/api-client';
import { lumberPlanKeys } from './keys';

/** `POST /api/shop/orders/:id/lumber-plan/replan` → the plan's status with its run queued. */
export const replanOrder = (orderId: number) =>
  api.request(`/api/shop/orders/${orderId}/lumber-plan/replan`, {
    method: 'POST',
    schema: shopPlanStatusSchema,
  });

/** Asks for a new plan; the answer (queued) replaces the cached status, which then polls. */
export function useReplan(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => replanOrder(orderId),
    onSuccess: (status) => queryClient.setQueryData(lumberPlanKeys.order(orderId), status),
  });
}
