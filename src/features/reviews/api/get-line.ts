import { queryOptions, useQuery } from '@tanstack/react-query';
import { lineSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';

/** `GET /api/orders/:orderId/lines/:lineId`: the stored line under review. */
export const reviewLineQueryOptions = (orderId: number, lineId: number) =>
  queryOptions({
    queryKey: orderKeys.line(orderId, lineId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/lines/${lineId}`, { schema: lineSchema, signal }),
  });

/** The stored line; disabled until its order is known. */
export function useReviewLine(orderId: number | undefined, lineId: number) {
  return useQuery({
    ...reviewLineQueryOptions(orderId ?? 0, lineId),
    enabled: orderId !== undefined,
  });
}
