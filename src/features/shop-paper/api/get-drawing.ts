import { queryOptions, useQuery } from '@tanstack/react-query';
import { shopDrawingSchema } from '../../../../shared/api/shopPaper';
import { api } from '../../../lib/api-client';
import { shopPaperKeys } from './keys';

/** `GET /api/orders/:id/shop-paper/lines/:lineId`: one mark's shop drawing. */
export const shopDrawingQueryOptions = (orderId: number, lineId: number) =>
  queryOptions({
    queryKey: shopPaperKeys.drawing(orderId, lineId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/shop-paper/lines/${lineId}`, {
        schema: shopDrawingSchema,
        signal,
      }),
    retry: false,
  });

/** One truss mark's shop drawing. */
export const useShopDrawing = (orderId: number, lineId: number) =>
  useQuery(shopDrawingQueryOptions(orderId, lineId));
