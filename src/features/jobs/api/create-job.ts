import { useMutation, useQueryClient } from '@tanstack/react-query';
import { jobSchema, type CreateJobInput, type JobDetail } from '../../../../shared/api/jobs';
import { api } from '../../../lib/api-client';
import { customerKeys, jobKeys } from '../../../lib/query-keys';

/** `POST /api/customers/:id/jobs` → 201 JobDetail. */
export function createJob(customerId: number, body: CreateJobInput): Promise<JobDetail> {
  return api.request(`/api/customers/${customerId}/jobs`, {
    method: 'POST',
    body,
    schema: jobSchema,
  });
}

/** Adds a job for a builder; job lists and the builder (its job count) refetch. */
export function useCreateJob(customerId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateJobInput) => createJob(customerId, body),
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: customerKeys.detail(customerId) }),
        queryClient.invalidateQueries({ queryKey: customerKeys.lists() }),
      ]);
    },
  });
}
