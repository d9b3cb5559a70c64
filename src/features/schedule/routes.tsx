import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import type { BoardPermissions } from './components/SchedulePage';

/** Who opens the board: foreman and plant manager move orders; the desk reads. */
export const SCHEDULE_ROLES = ['admin', 'foreman', 'sales'] as const satisfies readonly Role[];

/** Routes of the schedule board (`/schedule`), its page code loaded only when opened. */
export function scheduleRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'schedule',
      loader: async ({ request }: LoaderFunctionArgs) => {
        const me = await requireRole(queryClient, request, SCHEDULE_ROLES);
        const board: BoardPermissions = {
          canMove: me.user.role !== 'sales',
          canHoldRelease: me.user.role === 'admin',
        };
        return board;
      },
      lazy: async () => {
        const { SchedulePage } = await import('./components/SchedulePage');
        return {
          Component: function ScheduleRoute() {
            return <SchedulePage {...useLoaderData<BoardPermissions>()} />;
          },
        };
      },
    },
  ];
}
