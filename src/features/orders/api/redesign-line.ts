import { useMutation, useQueryClient } from '@tanstack/react-query';
import { lineSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys, reviewKeys } from '../../../lib/query-keys';

/**
 * `POST /api/orders/:id/lines/:lineId/redesign` → LineDetail: the line designed again with its
 * job's current loads (same geometry and lumber choices); it needs a new review.
 */
export function redesignLine(orderId: number, lineId: number) {
  return api.request(`/api/orders/${orderId}/lines/${lineId}/redesign`, {
    method: 'POST',
    schema: lineSchema,
  });
}

/** The redesign mutation; the order, its lists and the review queue refetch. */
export function useRedesignLine(orderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (lineId: number) => redesignLine(orderId, lineId),
    onSuccess: (line) => {
      queryClient.setQueryData(orderKeys.line(orderId, line.id), line);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
      ]);
    },
  });
}
