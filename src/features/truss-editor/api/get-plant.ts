import { queryOptions, useQuery } from '@tanstack/react-query';
import { plantSchema } from '../../../../shared/api/plant';
import { api } from '../../../lib/api-client';
import { plantKeys } from '../../../lib/query-keys';

/** `GET /api/plant`: the signed-in user's plant, for its units. */
export const plantQueryOptions = () =>
  queryOptions({
    queryKey: plantKeys.summary(),
    queryFn: ({ signal }) => api.request('/api/plant', { schema: plantSchema, signal }),
    staleTime: 5 * 60_000,
  });

/** The plant. */
export function usePlant() {
  return useQuery(plantQueryOptions());
}
