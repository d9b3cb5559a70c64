import { useMutation, useQueryClient } from '@tanstack/react-query';
import { lineSchema, type LineDetail } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys, reviewKeys, taskKeys } from '../../../lib/query-keys';

/** Body of the review command: the decision on the design version the reviewer looked at. */
export interface ReviewDecision {
  decision: 'approve' | 'return';
  comment: string;
  designVersion: number;
}

/** `POST /api/orders/:orderId/lines/:lineId/review` → the reviewed line. */
export function submitReview(orderId: number, lineId: number, body: ReviewDecision) {
  return api.request<LineDetail>(`/api/orders/${orderId}/lines/${lineId}/review`, {
    method: 'POST',
    body,
    schema: lineSchema,
  });
}

/** The review mutation; refreshes the queue, the line and its order. */
export function useSubmitReview(orderId: number, lineId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReviewDecision) => submitReview(orderId, lineId, body),
    onSuccess: async (line) => {
      queryClient.setQueryData(orderKeys.line(orderId, lineId), line);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
        queryClient.invalidateQueries({ queryKey: taskKeys.all }),
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
      ]);
    },
    // The design changed while it was open: show the current one (the message says so).
    onError: async (error) => {
      if ((error as { code?: string }).code === 'stale')
        await queryClient.invalidateQueries({ queryKey: orderKeys.line(orderId, lineId) });
    },
  });
}
