import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { reviewKeys } from '../../../lib/query-keys';

const lineOrderSchema = z.object({ lineId: z.number(), orderId: z.number() });

/** `GET /api/reviews/lines/:lineId`: the order a line is on, for a review link without `?order=`. */
export function useLineOrder(lineId: number, enabled: boolean) {
  return useQuery({
    queryKey: [...reviewKeys.all, 'line-order', lineId] as const,
    queryFn: ({ signal }) =>
      api.request(`/api/reviews/lines/${lineId}`, { schema: lineOrderSchema, signal }),
    enabled,
    staleTime: Infinity,
  });
}
