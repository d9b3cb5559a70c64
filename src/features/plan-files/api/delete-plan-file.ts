import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { planFileKeys } from './plan-file-keys';

/** `DELETE /api/files/:id` → 204. */
export function deletePlanFile(fileId: number): Promise<void> {
  return api.request<void>(`/api/files/${fileId}`, { method: 'DELETE' });
}

/** Deletes a plan; the job's list refetches. */
export function useDeletePlanFile(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePlanFile,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: planFileKeys(jobId) }),
  });
}
