import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { jobSchema, type JobDetail, type UpdateJobInput } from '../../../../shared/api/jobs';
import { plantSchema } from '../../../../shared/api/plant';
import { api } from '../../../lib/api-client';
import { jobKeys, plantKeys } from '../../../lib/query-keys';

/** `GET /api/jobs/:id` query options. */
export const jobQueryOptions = (id: number) =>
  queryOptions({
    queryKey: jobKeys.detail(id),
    queryFn: ({ signal }) => api.request(`/api/jobs/${id}`, { schema: jobSchema, signal }),
  });

/** One job with its criteria, effective loads and orders. */
export function useJob(id: number) {
  return useQuery(jobQueryOptions(id));
}

/** `PATCH /api/jobs/:id` → JobDetail. */
export function updateJob(id: number, change: UpdateJobInput): Promise<JobDetail> {
  return api.request(`/api/jobs/${id}`, { method: 'PATCH', body: change, schema: jobSchema });
}

/** Saves a change to a job; its page and every job list refetch. */
export function useUpdateJob(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateJobInput) => updateJob(id, change),
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(id), job);
      return queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}

/** `GET /api/plant` query options: units and default loads change rarely, so cache them a while. */
export const plantQueryOptions = () =>
  queryOptions({
    queryKey: plantKeys.summary(),
    queryFn: ({ signal }) => api.request('/api/plant', { schema: plantSchema, signal }),
    staleTime: 10 * 60_000,
  });

/** The signed-in user's plant: units and default design loads. */
export function usePlant() {
  return useQuery(plantQueryOptions());
}
