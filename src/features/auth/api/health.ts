import { queryOptions, useQuery } from '@tanstack/react-query';
import * as z from 'zod/mini';
import { api } from '../../../lib/api-client';
import { authKeys } from '../../../lib/query-keys';

/** Body of the public `GET /api/health`. */
export const healthSchema = z.object({
  status: z.string(),
  db: z.unknown(),
  demo: z.boolean(),
});
/** Server health as the sign-in page reads it. */
export type Health = z.infer<typeof healthSchema>;

/** `GET /api/health` (public). */
export function fetchHealth(signal?: AbortSignal): Promise<Health> {
  return api.request('/api/health', { schema: healthSchema, signal });
}

/** Query options of the health check; one try, the sign-in page works without it. */
export const healthQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.health(),
    queryFn: ({ signal }) => fetchHealth(signal),
    staleTime: 60_000,
    retry: false,
  });

/** Server health (used to show the demo-account note). */
export function useHealth() {
  return useQuery(healthQueryOptions());
}
