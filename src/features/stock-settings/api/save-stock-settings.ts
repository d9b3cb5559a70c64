import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StockSettings } from '../../../../shared/api/stock';
import { api } from '../../../lib/api-client';
import { storedStockSettingsSchema, type StoredStockSettings } from './get-stock-settings';
import { stockSettingsKeys } from './keys';

/** `PUT /api/stock` (admin) → the stored settings. */
export function saveStockSettings(settings: StockSettings): Promise<StoredStockSettings> {
  return api.request('/api/stock', {
    method: 'PUT',
    body: settings,
    schema: storedStockSettingsSchema,
  });
}

/** Saves the settings; the answer replaces the cached ones. */
export function useSaveStockSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveStockSettings,
    onSuccess: (stored) => {
      queryClient.setQueryData(stockSettingsKeys.current(), stored);
      return queryClient.invalidateQueries({ queryKey: stockSettingsKeys.all });
    },
  });
}
