import { queryOptions, useQuery } from '@tanstack/react-query';
import { customerSummarySchema, pageOf } from '../../../../shared/api/list';
import { api } from '../../../lib/api-client';
import { customerKeys } from '../../../lib/query-keys';

const params = { page: 1, pageSize: 100, sort: 'name' } as const;

/** Builder companies for the "Add user" select: `GET /api/customers`, first 100 by name. */
export const builderOptionsQueryOptions = () =>
  queryOptions({
    queryKey: customerKeys.list(params),
    queryFn: ({ signal }) =>
      api.request('/api/customers', {
        query: params,
        schema: pageOf(customerSummarySchema),
        signal,
      }),
  });

/** Builder companies to pick from; only fetched when `enabled` (builder role chosen). */
export function useBuilderOptions(enabled: boolean) {
  return useQuery({ ...builderOptionsQueryOptions(), enabled });
}
