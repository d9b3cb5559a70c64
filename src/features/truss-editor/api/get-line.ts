import { queryOptions, useQuery } from '@tanstack/react-query';
import { lineSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';

/** `GET /api/orders/:orderId/lines/:lineId`: a stored line with its design input and result. */
export const lineQueryOptions = (orderId: number, lineId: number) =>
  queryOptions({
    queryKey: orderKeys.line(orderId, lineId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/lines/${lineId}`, { schema: lineSchema, signal }),
  });

/** One stored line; disabled for a new line (no id). */
export function useLine(orderId: number, lineId: number | undefined) {
  return useQuery({ ...lineQueryOptions(orderId, lineId ?? 0), enabled: lineId !== undefined });
}
