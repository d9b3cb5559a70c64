import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { requireRole } from './guards';

const BUILDER = ['builder'] as const;
const pages = () => import('./portal-pages');

/** The builder's portal: lazy routes, so its code (and only its code) loads when a builder opens it. */
export function portalRoutes(queryClient: QueryClient): RouteObject[] {
  const guard = async ({ request }: { request: Request }) => {
    await requireRole(queryClient, request, BUILDER);
    return null;
  };
  return [
    {
      path: 'portal',
      loader: guard,
      // The home is its own chunk: a builder's first load carries no quote drawing or forms.
      lazy: async () => ({
        Component: (await import('../features/portal/components/PortalHome')).PortalHome,
      }),
    },
    {
      path: 'portal/orders/:id',
      loader: guard,
      lazy: async () => ({ Component: (await pages()).PortalOrderRoute }),
    },
    {
      path: 'portal/orders/:id/quotes/:number',
      loader: guard,
      lazy: async () => ({ Component: (await pages()).BuilderQuoteRoute }),
    },
  ];
}
