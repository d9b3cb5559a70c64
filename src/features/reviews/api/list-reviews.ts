import { useQuery } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/api/list';
import { reviewQueueItemSchema } from '../../../../shared/api/orders';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { reviewKeys, type ListParams } from '../../../lib/query-keys';

const reviewPageSchema = pageOf(reviewQueueItemSchema);

/** `GET /api/reviews?page&pageSize`: pending lines, passing designs first. */
export const reviewQueueQueryOptions = (params: ListParams) =>
  pagedListQueryOptions({
    queryKey: reviewKeys.list(params),
    path: '/api/reviews',
    schema: reviewPageSchema,
    params,
  });

/** One page of the review queue. */
export function useReviewQueue(params: ListParams) {
  return useQuery(reviewQueueQueryOptions(params));
}
