import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DesignInputDraft } from '../../../../shared/api/design';
import type { PresentedDesign } from '../../../../shared/engine/design';
import { isPresentedDesign } from '../../../components/truss/from-design';
import { api, createApiError } from '../../../lib/api-client';
import { designKeys } from '../../../lib/query-keys';

/**
 * `POST /api/designs/preview`: the server's design of an unsaved input. Only a fallback: the
 * editor designs in the browser and asks the server when the local engine fails unexpectedly.
 */
export const previewQueryOptions = (design: DesignInputDraft) =>
  queryOptions({
    queryKey: designKeys.preview(design),
    queryFn: async ({ signal }): Promise<PresentedDesign> => {
      const result = await api.request<unknown>('/api/designs/preview', {
        method: 'POST',
        body: design,
        signal,
      });
      if (!isPresentedDesign(result)) {
        throw createApiError(
          200,
          'bad_response',
          'The server sent a design this page cannot draw.',
        );
      }
      return result;
    },
    staleTime: Infinity,
  });

/** The server preview, only while `enabled`. */
export function useServerPreview(design: DesignInputDraft | null, enabled: boolean) {
  return useQuery({
    ...previewQueryOptions(design ?? ({} as DesignInputDraft)),
    enabled: enabled && design !== null,
  });
}
