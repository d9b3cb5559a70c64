import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';

/** Who records progress on the floor. */
export const FLOOR_ROLES = ['admin', 'foreman'] as const satisfies readonly Role[];

/** The tablet page of today's work (`/floor`), loaded only when opened. */
export function floorRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'floor',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, FLOOR_ROLES);
        return null;
      },
      lazy: async () => ({ Component: (await import('./components/FloorPage')).FloorPage }),
    },
    {
      path: 'quality',
      loader: async ({ request }: LoaderFunctionArgs) => {
        await requireRole(queryClient, request, FLOOR_ROLES);
        return null;
      },
      lazy: async () => ({ Component: (await import('./components/QualityPage')).QualityPage }),
    },
  ];
}
