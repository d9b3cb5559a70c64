import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { listParamsFromSearch } from '../../lib/list-params';
import { reviewLineQueryOptions } from './api/get-line';
import { reviewQueueQueryOptions } from './api/list-reviews';
import { orderIdFromSearch } from './review-link';
import { lazyPage } from '../../app/lazy-page';

const ReviewQueuePage = lazyPage(() =>
  import('./components/ReviewQueuePage').then((m) => m.ReviewQueuePage),
);

/** Who reviews designs: the design reviewer and the plant manager. */
export const REVIEW_ROLES = ['admin', 'engineer'] as const satisfies readonly Role[];

/** How long a loader waits for data before the page shows its own spinner. */
const PREFETCH_WAIT_MS = 800;

const settleWithin = (promise: Promise<unknown>) =>
  Promise.race([
    promise.then(
      () => null,
      () => null,
    ),
    new Promise<null>((resolve) => setTimeout(() => resolve(null), PREFETCH_WAIT_MS)),
  ]);

/**
 * Routes of the design review, relative to the signed-in frame: the queue and one line's
 * review (`/reviews/:lineId?order=:orderId`). Loaders check the role and prefetch.
 */
export function reviewRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'reviews',
      loader: async ({ request }) => {
        await requireRole(queryClient, request, REVIEW_ROLES);
        const params = listParamsFromSearch(new URL(request.url).searchParams);
        return settleWithin(queryClient.ensureQueryData(reviewQueueQueryOptions(params)));
      },
      element: <ReviewQueuePage />,
    },
    {
      path: 'reviews/:lineId',
      loader: async ({ request, params }) => {
        await requireRole(queryClient, request, REVIEW_ROLES);
        const orderId = orderIdFromSearch(new URL(request.url).searchParams);
        const lineId = Number(params.lineId);
        if (orderId === undefined || !Number.isInteger(lineId) || lineId <= 0) return null;
        return settleWithin(queryClient.ensureQueryData(reviewLineQueryOptions(orderId, lineId)));
      },
      // The review page draws with the engine: loaded only when a reviewer opens it.
      lazy: async () => ({ Component: (await import('./components/ReviewPage')).ReviewPage }),
    },
  ];
}
