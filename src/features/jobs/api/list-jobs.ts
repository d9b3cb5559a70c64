import { useQuery } from '@tanstack/react-query';
import { jobSummarySchema, pageOf } from '../../../../shared/api/list';
import { idFilterFromSearch, listParamsFromSearch } from '../../../lib/list-params';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { jobKeys, type ListParams } from '../../../lib/query-keys';

const jobPageSchema = pageOf(jobSummarySchema);

/** Query of `GET /api/jobs`: list params plus the builder filter. */
export interface JobListParams extends ListParams {
  customerId?: number;
}

/** `GET /api/jobs`: a page of jobs (the server scopes builders to their company). */
export const jobsQueryOptions = (params: JobListParams) =>
  pagedListQueryOptions({
    queryKey: jobKeys.list(params),
    path: '/api/jobs',
    schema: jobPageSchema,
    params,
  });

/** One page of jobs. */
export function useJobs(params: JobListParams) {
  return useQuery(jobsQueryOptions(params));
}

/** Jobs list newest first unless the URL says otherwise (the server's default too). */
export const DEFAULT_JOB_SORT = '-createdAt';

/** Reads the jobs list's query (search, page, sort, builder) from the URL. */
export function jobListParamsFromSearch(search: URLSearchParams): JobListParams {
  const customerId = idFilterFromSearch(search, 'customerId');
  const params = listParamsFromSearch(search);
  return {
    ...params,
    sort: params.sort ?? DEFAULT_JOB_SORT,
    ...(customerId ? { customerId } : {}),
  };
}
