import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import { requireRole } from '../../app/guards';

/** The plant manager's design rules (`/design-rules`), loaded when opened. */
export function designRulesRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'design-rules',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, ['admin']);
        return null;
      },
      lazy: async () => ({
        Component: (await import('./components/DesignRulesPage')).DesignRulesPage,
      }),
    },
  ];
}
