import { queryOptions, useQuery } from '@tanstack/react-query';
import { deliveryTicketSchema } from '../../../../shared/api/shopPaper';
import { api } from '../../../lib/api-client';
import { shopPaperKeys } from './keys';

/** `GET /api/orders/:id/shop-paper/delivery`: the delivery ticket. */
export const deliveryQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: shopPaperKeys.delivery(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/shop-paper/delivery`, {
        schema: deliveryTicketSchema,
        signal,
      }),
    retry: false,
  });

/** The order's delivery ticket. */
export const useDeliveryTicket = (orderId: number) => useQuery(deliveryQueryOptions(orderId));
