import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';

/** Who opens the board: foreman and plant manager move orders; the desk reads. */
export const SCHEDULE_ROLES = ['admin', 'foreman', 'sales'] as const satisfies readonly Role[];

/** Routes of the schedule board (`/schedule`), its page code loaded only when opened. */
export function scheduleRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'schedule',
      loader: async ({ request }: LoaderFunctionArgs) => {
        const me = await requireRole(queryClient, request, SCHEDULE_ROLES);
        return { canMove: me.user.role !== 'sales' };
      },
      lazy: async () => {
        const { SchedulePage } = await import('./components/SchedulePage');
        return {
          Component: function ScheduleRoute() {
            const { canMove } = useLoaderData<{ canMove: boolean }>();
            return <SchedulePage canMove={canMove} />;
          },
        };
      },
    },
  ];
}
