import { queryOptions, useQuery } from '@tanstack/react-query';
import { jobSchema } from '../../../../shared/api/jobs';
import { orderSchema } from '../../../../shared/api/orders';
import { api } from '../../../lib/api-client';
import { jobKeys, orderKeys } from '../../../lib/query-keys';

/** `GET /api/orders/:id`: the order a reviewed line belongs to (its number, job and builder). */
export const reviewOrderQueryOptions = (orderId: number) =>
  queryOptions({
    queryKey: orderKeys.detail(orderId),
    queryFn: ({ signal }) => api.request(`/api/orders/${orderId}`, { schema: orderSchema, signal }),
  });

/** `GET /api/jobs/:id`: the job of the reviewed line (address, plan revision, loads). */
export const reviewJobQueryOptions = (jobId: number) =>
  queryOptions({
    queryKey: jobKeys.detail(jobId),
    queryFn: ({ signal }) => api.request(`/api/jobs/${jobId}`, { schema: jobSchema, signal }),
  });

/** The order and job around a line under review; the job waits for the order. */
export function useReviewContext(orderId: number) {
  const order = useQuery(reviewOrderQueryOptions(orderId));
  const jobId = order.data?.job.id;
  const job = useQuery({ ...reviewJobQueryOptions(jobId ?? 0), enabled: jobId !== undefined });
  return { order, job };
}
