import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { lumberPlanQueryOptions } from './api/get-lumber-plan';
import { lazyPage } from '../../app/lazy-page';

const LumberPlanPage = lazyPage(() =>
  import('./components/LumberPlanPage').then((m) => m.LumberPlanPage),
);

/** Who sees shop paper: the foreman, the desk and the plant manager. */
export const LUMBER_PLAN_ROLES = ['admin', 'sales', 'foreman'] as const satisfies readonly Role[];

function LumberPlanRoute() {
  const { orderId } = useLoaderData<{ orderId: number }>();
  return <LumberPlanPage orderId={orderId} />;
}

/** Routes of the lumber plan: `/shop/orders/:id/lumber-plan`. */
export function lumberPlanRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'shop/orders/:id/lumber-plan',
      loader: async ({ request, params }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, LUMBER_PLAN_ROLES);
        const orderId = Number(params.id);
        // The page shows the error (e.g. not yet approved) itself.
        void queryClient.prefetchQuery(lumberPlanQueryOptions(orderId));
        return { orderId };
      },
      element: <LumberPlanRoute />,
    },
  ];
}
