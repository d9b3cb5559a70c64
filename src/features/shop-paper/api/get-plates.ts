import { queryOptions, useQuery } from '@tanstack/react-query';
import { plateScheduleSchema } from '../../../../shared/api/shopPaper';
import { api } from '../../../lib/api-client';
import { shopPaperKeys } from './keys';

/** `GET /api/orders/:id/shop-paper/plates`: the plate schedule. */
export const plateScheduleQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: shopPaperKeys.plates(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/shop-paper/plates`, {
        schema: plateScheduleSchema,
        signal,
      }),
    retry: false,
  });

/** The order's plate schedule. */
export const usePlateSchedule = (orderId: number) => useQuery(plateScheduleQueryOptions(orderId));
