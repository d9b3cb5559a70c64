import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { cutListQueryOptions } from './api/get-cut-list';
import { shopOrdersQueryOptions } from './api/list-shop-orders';

/** Who opens the shop pages: the foreman, and the desk and plant manager (the server agrees). */
export const SHOP_ROLES = ['foreman', 'sales', 'admin'] as const satisfies readonly Role[];

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

const orderIdOf = (raw: string | undefined) => {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such order.', { status: 404 });
  return id;
};

/** Routes of the shop, relative to the signed-in frame: `/shop` and `/shop/orders/:id`; the pages load lazily. */
export function shopRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'shop',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, SHOP_ROLES);
        await settleWithin(queryClient.ensureQueryData(shopOrdersQueryOptions()));
        return null;
      },
      lazy: async () => ({
        Component: (await import('./components/ShopOrdersPage')).ShopOrdersPage,
      }),
    },
    {
      path: 'shop/orders/:id',
      loader: async ({ request, params }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, SHOP_ROLES);
        await settleWithin(queryClient.ensureQueryData(cutListQueryOptions(orderIdOf(params.id))));
        return null;
      },
      lazy: async () => {
        const { CutListPage } = await import('./components/CutListPage');
        return {
          Component: function CutListRoute() {
            return <CutListPage orderId={orderIdOf(useParams().id)} />;
          },
        };
      },
    },
  ];
}
