import { queryOptions, useQuery } from '@tanstack/react-query';
import { jobSchema } from '../../../../shared/api/jobs';
import { api } from '../../../lib/api-client';
import { jobKeys } from '../../../lib/query-keys';

/** `GET /api/jobs/:id`: the job whose plans these are (its name heads the page). */
export const planJobQueryOptions = (jobId: number) =>
  queryOptions({
    queryKey: jobKeys.detail(jobId),
    queryFn: ({ signal }) => api.request(`/api/jobs/${jobId}`, { schema: jobSchema, signal }),
  });

/** The job of the plans page. */
export function usePlanJob(jobId: number) {
  return useQuery(planJobQueryOptions(jobId));
}
