import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { mailStateSchema, type MailState } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { orderMailKeys } from '../../../lib/query-keys';

const mailListSchema = z.object({ items: z.array(mailStateSchema) });

/** While a message is still on its way its state changes by itself: look again now and then. */
const UNSETTLED: MailState['status'][] = ['queued', 'retrying'];

/** `GET /api/orders/:id/mail` (sales, admin): every message about the order, newest first. */
export const orderMailQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: orderMailKeys.list(orderId),
    queryFn: ({ signal }) =>
      api.request(`/api/orders/${orderId}/mail`, { schema: mailListSchema, signal }),
    refetchInterval: (query) =>
      query.state.data?.items.some((m) => UNSETTLED.includes(m.status)) ? 5000 : false,
  });

/** The delivery state of each e-mail the order caused (quote, confirmation, receipt …). */
export function useOrderMail(orderId: number) {
  return useQuery(orderMailQueryOptions(orderId));
}
