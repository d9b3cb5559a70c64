import { queryOptions, useQuery } from '@tanstack/react-query';
import { orderSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `GET /api/orders/:id` as the builder reads it (their history, payments, acceptance). */
export const portalOrderQueryOptions = (id: number) =>
  queryOptions({
    queryKey: portalKeys.order(id),
    queryFn: ({ signal }) => api.request(`/api/orders/${id}`, { schema: orderSchema, signal }),
  });

/** The order; `awaitPayment` polls each second while a paid deposit is not yet confirmed. */
export const usePortalOrder = (id: number, awaitPayment = false) =>
  useQuery({
    ...portalOrderQueryOptions(id),
    refetchInterval: (q) => (awaitPayment && q.state.data?.status === 'accepted' ? 1000 : false),
  });
