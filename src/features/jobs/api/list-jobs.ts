import { useQuery } from '@tanstack/react-query';
import { jobSummarySchema, pageOf } from '../../../../shared/api/list';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { jobKeys, type ListParams } from '../../../lib/query-keys';

const jobPageSchema = pageOf(jobSummarySchema);

/** `GET /api/jobs`: a page of jobs (the server scopes builders to their company). */
export const jobsQueryOptions = (params: ListParams) =>
  pagedListQueryOptions({
    queryKey: jobKeys.list(params),
    path: '/api/jobs',
    schema: jobPageSchema,
    params,
  });

/** One page of jobs. */
export function useJobs(params: ListParams) {
  return useQuery(jobsQueryOptions(params));
}
