import { queryOptions, useQuery } from '@tanstack/react-query';
import { tasksSchema } from '../../../../shared/api/tasks';
import { api } from '../../../lib/api-client';
import { taskKeys } from '../../../lib/query-keys';

/** `GET /api/tasks`: the lists of what waits for the signed-in staff member. */
export const tasksQueryOptions = () =>
  queryOptions({
    queryKey: taskKeys.mine(),
    queryFn: ({ signal }) => api.request('/api/tasks', { schema: tasksSchema, signal }),
    // A home page is where one comes back to see what changed: always ask again.
    staleTime: 0,
  });

/** The signed-in user's task lists. */
export const useTasks = () => useQuery(tasksQueryOptions());
