import { queryOptions, useQuery } from '@tanstack/react-query';
import { profileComparisonsSchema } from '../../../../shared/api/compare';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { api } from '../../../lib/api-client';
import { designKeys } from '../../../lib/query-keys';

/** `POST /api/designs/compare`: the request designed as every profile that fits, side by side. */
export const compareQueryOptions = (design: DesignInputDraft) =>
  queryOptions({
    queryKey: designKeys.compare(design),
    queryFn: ({ signal }) =>
      api.request('/api/designs/compare', {
        method: 'POST',
        body: design,
        schema: profileComparisonsSchema,
        signal,
      }),
    staleTime: Infinity,
  });

/** The comparison of the current input, only once asked for (`design` non-null). */
export function useProfileComparison(design: DesignInputDraft | null) {
  return useQuery({
    ...compareQueryOptions(design ?? ({} as DesignInputDraft)),
    enabled: design !== null,
  });
}
