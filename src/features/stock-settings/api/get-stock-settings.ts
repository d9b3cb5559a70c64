import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { stockSettingsSchema } from '../../../../shared/api/stock';
import { api } from '../../../lib/api-client';
import { stockSettingsKeys } from './keys';

/** The answer of `GET`/`PUT /api/stock`: the settings, `demo` while invented, last save. */
export const storedStockSettingsSchema = stockSettingsSchema.extend({
  demo: z.boolean().default(false),
  updatedAt: z.string().nullable().default(null),
  updatedBy: z.string().nullable().default(null),
});
export type StoredStockSettings = z.infer<typeof storedStockSettingsSchema>;

/** `GET /api/stock` query options. */
export const stockSettingsQueryOptions = () =>
  queryOptions({
    queryKey: stockSettingsKeys.current(),
    queryFn: ({ signal }) =>
      api.request('/api/stock', { schema: storedStockSettingsSchema, signal }),
  });

/** The plant's lumber stock settings. */
export function useStockSettings() {
  return useQuery(stockSettingsQueryOptions());
}
