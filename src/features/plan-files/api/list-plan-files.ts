import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { storedFileSchema } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { planFileKeys } from './plan-file-keys';

/** A listed plan, with whether the signed-in user may delete it (shared contract). */
export const planFileRowSchema = storedFileSchema;
/** One row of the plans list. */
export type PlanFileRow = z.infer<typeof planFileRowSchema>;

/** `GET /api/jobs/:jobId/files` query options: the job's plans, newest first. */
export const planFilesQueryOptions = (jobId: number) =>
  queryOptions({
    queryKey: planFileKeys(jobId),
    queryFn: ({ signal }) =>
      api.request(`/api/jobs/${jobId}/files`, { schema: z.array(planFileRowSchema), signal }),
  });

/** The job's plan files. */
export function usePlanFiles(jobId: number) {
  return useQuery(planFilesQueryOptions(jobId));
}

/** Where a plan downloads from (the server sends it as an attachment). */
export const planFileUrl = (fileId: number) => `/api/files/${fileId}`;
