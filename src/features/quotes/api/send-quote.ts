import { useMutation, useQueryClient } from '@tanstack/react-query';
import { quoteSchema, type Quote } from '../../../../shared/api/pricing';
import type { SendQuoteInput } from '../../../../shared/api/quoteSend';
import { api } from '../../../lib/api-client';
import { orderKeys } from '../../../lib/query-keys';
import { quoteKeys } from './keys';

/** `POST /api/orders/:id/quotes/:number/send { recipients }` → the quote with `sentAt` and `sentTo`. */
export function sendQuote(orderId: number, number: number, body: SendQuoteInput): Promise<Quote> {
  return api.request(`/api/orders/${orderId}/quotes/${number}/send`, {
    method: 'POST',
    body,
    schema: quoteSchema,
  });
}

/** E-mails the quote to the builder company; the revision, its list and the order refetch. */
export function useSendQuote(orderId: number, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SendQuoteInput) => sendQuote(orderId, number, body),
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(orderId, number), quote);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: quoteKeys.list(orderId) }),
        queryClient.invalidateQueries({ queryKey: orderKeys.detail(orderId), exact: true }),
      ]);
    },
  });
}
