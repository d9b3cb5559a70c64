import { useQuery } from '@tanstack/react-query';
import { customerSummarySchema, pageOf } from '../../shared/api/list';
import { pagedListQueryOptions } from './paged-list';
import { customerKeys, type ListParams } from './query-keys';

/** Every builder company by name for pick lists: the API's largest page (shared/api/list.ts). */
export const BUILDER_CHOICES: ListParams = { page: 1, pageSize: 100, sort: 'name' };

/** `GET /api/customers` for the builder filter of the jobs and orders lists. */
export const builderChoicesQueryOptions = () =>
  pagedListQueryOptions({
    queryKey: customerKeys.list(BUILDER_CHOICES),
    path: '/api/customers',
    schema: pageOf(customerSummarySchema),
    params: BUILDER_CHOICES,
  });

/** Builder companies to filter by; `enabled` is false for roles that cannot list them. */
export function useBuilderChoices(enabled: boolean) {
  return useQuery({ ...builderChoicesQueryOptions(), enabled });
}
