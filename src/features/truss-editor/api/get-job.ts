import { queryOptions, useQuery } from '@tanstack/react-query';
import { jobSchema } from '../../../../shared/api/jobs';
import { api } from '../../../lib/api-client';
import { jobKeys } from '../../../lib/query-keys';

/** `GET /api/jobs/:id`: the job, whose `effectiveLoads` a new truss line starts from. */
export const jobQueryOptions = (jobId: number) =>
  queryOptions({
    queryKey: jobKeys.detail(jobId),
    queryFn: ({ signal }) => api.request(`/api/jobs/${jobId}`, { schema: jobSchema, signal }),
  });

/** One job; disabled until its id is known. */
export function useJob(jobId: number | undefined) {
  return useQuery({ ...jobQueryOptions(jobId ?? 0), enabled: jobId !== undefined });
}
