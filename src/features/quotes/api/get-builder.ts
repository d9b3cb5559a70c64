import { queryOptions, useQuery } from '@tanstack/react-query';
import { customerSchema } from '../../../../shared/api/customers';
import { api } from '../../../lib/api-client';
import { customerKeys } from '../../../lib/query-keys';

/** `GET /api/customers/:id`: the builder company a quote is sent to (its e-mail address). */
export const builderQueryOptions = (customerId: number) =>
  queryOptions({
    queryKey: customerKeys.detail(customerId),
    queryFn: ({ signal }) =>
      api.request(`/api/customers/${customerId}`, { schema: customerSchema, signal }),
  });

/** The builder company; only fetched when `enabled` (staff who may send the quote). */
export function useBuilder(customerId: number | undefined, enabled: boolean) {
  return useQuery({
    ...builderQueryOptions(customerId ?? 0),
    enabled: enabled && customerId !== undefined,
  });
}
