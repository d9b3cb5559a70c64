import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { mailQueryOptions } from './api/list-mail';
import { lazyPage } from '../../app/lazy-page';

const InboxPage = lazyPage(() => import('./components/InboxPage').then((m) => m.InboxPage));

/** Who opens the demo inbox: the plant manager (the server allows only them). */
export const INBOX_ROLES = ['admin'] as const satisfies readonly Role[];

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

/** Routes of the demo inbox, relative to the signed-in frame: `/inbox`. */
export function inboxRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'inbox',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, INBOX_ROLES);
        return settleWithin(queryClient.ensureQueryData(mailQueryOptions()));
      },
      element: <InboxPage />,
    },
  ];
}
