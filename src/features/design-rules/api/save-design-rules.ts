import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designRulesDetailSchema, type UpdateDesignRulesInput } from '../../../../shared/api/plant';
import { api, isApiError } from '../../../lib/api-client';
import { designRulesKeys } from './keys';

/** `PUT /api/plant/design-rules` (plant manager) with the version seen; 409 `stale` if it moved. */
export function saveDesignRules(body: UpdateDesignRulesInput) {
  return api.request('/api/plant/design-rules', {
    method: 'PUT',
    body,
    schema: designRulesDetailSchema,
  });
}

/** Saves the rules; the answer (with its new version) replaces the cached rules. */
export function useSaveDesignRules() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDesignRules,
    onSuccess: (saved) => {
      queryClient.setQueryData(designRulesKeys.current(), saved);
      return queryClient.invalidateQueries({ queryKey: designRulesKeys.all });
    },
    // Stale (409): fetch the rules someone else saved, so the next save sends their version.
    onError: (error) =>
      isApiError(error) && error.status === 409
        ? queryClient.invalidateQueries({ queryKey: designRulesKeys.all })
        : undefined,
  });
}
