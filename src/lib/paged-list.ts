import { keepPreviousData, queryOptions, type QueryKey } from '@tanstack/react-query';
import type { core } from 'zod/mini';
import { api } from './api-client';
import type { ListParams } from './query-keys';

/** Query options of one page of a list endpoint (`{ items, total, page, pageSize }`). */
export function pagedListQueryOptions<T, K extends QueryKey>(options: {
  queryKey: K;
  path: string;
  schema: core.$ZodType<{ items: T[]; total: number; page: number; pageSize: number }>;
  params: ListParams;
}) {
  const { queryKey, path, schema, params } = options;
  return queryOptions({
    queryKey,
    queryFn: ({ signal }) => api.request(path, { query: { ...params }, schema, signal }),
    // Keep the previous page on screen while the next one loads, so paging does not flash.
    placeholderData: keepPreviousData,
  });
}
