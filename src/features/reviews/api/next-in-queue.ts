import { useQuery } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/api/list';
import { reviewQueueItemSchema, type ReviewQueueItem } from '../../../../shared/api/orders';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { reviewKeys, type ListParams } from '../../../lib/query-keys';

/** The head of the queue: enough to find the next line other than the one just decided. */
const HEAD: ListParams = { page: 1, pageSize: 2 };

/** The next line waiting for review after `lineId`, or null when none is left. */
export function useNextInQueue(lineId: number, enabled: boolean) {
  return useQuery({
    ...pagedListQueryOptions({
      queryKey: reviewKeys.list(HEAD),
      path: '/api/reviews',
      schema: pageOf(reviewQueueItemSchema),
      params: HEAD,
    }),
    enabled,
    select: (page): ReviewQueueItem | null => page.items.find((i) => i.id !== lineId) ?? null,
  });
}
