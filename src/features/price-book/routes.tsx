import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { priceBookQueryOptions } from './api/get-price-book';
import { lazyPage } from '../../app/lazy-page';

const PriceBookPage = lazyPage(() =>
  import('./components/PriceBookPage').then((m) => m.PriceBookPage),
);

/** Who opens the price book: the plant manager (edits) and the sales desk (reads). */
export const PRICE_BOOK_ROLES = ['admin', 'sales'] as const satisfies readonly Role[];

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

/** What the page needs from its loader: whether the signed-in user may edit. */
interface PriceBookRouteData {
  canEdit: boolean;
}

function PriceBookRoute() {
  const { canEdit } = useLoaderData<PriceBookRouteData>();
  return <PriceBookPage canEdit={canEdit} />;
}

/** Routes of the price book, relative to the signed-in frame: `/price-book`. */
export function priceBookRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'price-book',
      loader: async ({ request }: LoaderFunctionArgs): Promise<PriceBookRouteData> => {
        const me = await requireRole(queryClient, request, PRICE_BOOK_ROLES);
        await settleWithin(queryClient.ensureQueryData(priceBookQueryOptions()));
        return { canEdit: me.user.role === 'admin' };
      },
      element: <PriceBookRoute />,
    },
  ];
}
