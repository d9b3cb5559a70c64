import { jobKeys } from '../../../lib/query-keys';

/** A job's plan files live under its detail key, so refreshing the job refreshes them too. */
export const planFileKeys = (jobId: number) => [...jobKeys.detail(jobId), 'files'] as const;
