import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { stockSettingsQueryOptions } from './api/get-stock-settings';
import { lazyPage } from '../../app/lazy-page';

const StockSettingsPage = lazyPage(() =>
  import('./components/StockSettingsPage').then((m) => m.StockSettingsPage),
);

/** The plant manager edits the stock; the foreman and the desk read it. */
export const STOCK_ROLES = ['admin', 'foreman', 'sales'] as const satisfies readonly Role[];

function StockRoute() {
  const { canEdit } = useLoaderData<{ canEdit: boolean }>();
  return <StockSettingsPage canEdit={canEdit} />;
}

/** Routes of the stock settings: `/stock`. */
export function stockSettingsRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'stock',
      loader: async ({ request }: LoaderFunctionArgs) => {
        const me = await requireRole(queryClient, request, STOCK_ROLES);
        await queryClient.ensureQueryData(stockSettingsQueryOptions()).catch(() => null);
        return { canEdit: me.user.role === 'admin' };
      },
      element: <StockRoute />,
    },
  ];
}
