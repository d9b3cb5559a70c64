import { useMutation, useQueryClient } from '@tanstack/react-query';
import { lineSchema, type LineDetail } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys, reviewKeys } from '../../../lib/query-keys';
import type { LineRequest } from '../form/convert';

/**
 * "Save truss": `POST /api/orders/:orderId/lines` for a new line, `PATCH …/lines/:lineId` for
 * a stored one. The server recomputes the design and answers the stored line.
 */
export function saveLine(orderId: number, lineId: number | undefined, body: LineRequest) {
  return lineId === undefined
    ? api.request<LineDetail>(`/api/orders/${orderId}/lines`, {
        method: 'POST',
        body,
        schema: lineSchema,
      })
    : api.request<LineDetail>(`/api/orders/${orderId}/lines/${lineId}`, {
        method: 'PATCH',
        body,
        schema: lineSchema,
      });
}

/** The save mutation; refreshes the order, its line and the review queue. */
export function useSaveLine(orderId: number, lineId: number | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: LineRequest) => saveLine(orderId, lineId, body),
    onSuccess: async (line) => {
      queryClient.setQueryData(orderKeys.line(orderId, line.id), line);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
        queryClient.invalidateQueries({ queryKey: orderKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
      ]);
    },
  });
}
