import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import { requireRole } from '../../app/guards';

/** The plant manager's production settings (`/production-settings`), loaded when opened. */
export function productionSettingsRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'production-settings',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, ['admin']);
        return null;
      },
      lazy: async () => ({
        Component: (await import('./components/ProductionSettingsPage')).ProductionSettingsPage,
      }),
    },
  ];
}
