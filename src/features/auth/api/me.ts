import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '../../../../shared/api/auth';
import { api, isApiError } from '../../../lib/api-client';
import { authKeys } from '../../../lib/query-keys';

/** `GET /api/auth/me`: the signed-in user, plant and (for builders) company. Throws 401 when signed out. */
export function fetchMe(signal?: AbortSignal): Promise<Me> {
  // Typed, not parsed: this answer is on a builder's first load, which carries no zod (README,
  // "Portal bundle"); tests/server parse it with the shared schema.
  return api.request<Me>('/api/auth/me', { signal });
}

/** Query options of the session; never retried on 401 (signed out is an answer, not a fault). */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: 5 * 60_000,
    retry: (count, error) => !(isApiError(error) && error.status === 401) && count < 2,
  });

/** The signed-in session (inside the guarded frame it is always loaded). */
export function useMe() {
  return useQuery(meQueryOptions());
}
