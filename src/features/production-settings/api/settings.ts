import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  productionSettingsResponseSchema,
  type ProductionSettings,
} from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';

const all = ['production-settings'] as const;

/** `GET /api/production/settings` query options. */
export const productionSettingsQueryOptions = () =>
  queryOptions({
    queryKey: [...all, 'current'] as const,
    queryFn: ({ signal }) =>
      api.request('/api/production/settings', { schema: productionSettingsResponseSchema, signal }),
  });

export const useProductionSettings = () => useQuery(productionSettingsQueryOptions());

/** `PUT /api/production/settings` (plant manager); the plant re-plans. */
export function useSaveProductionSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ProductionSettings) =>
      api.request('/api/production/settings', {
        method: 'PUT',
        body,
        schema: productionSettingsResponseSchema,
      }),
    onSuccess: (saved) => {
      queryClient.setQueryData(productionSettingsQueryOptions().queryKey, saved);
      return queryClient.invalidateQueries({ queryKey: ['schedule'] });
    },
  });
}
