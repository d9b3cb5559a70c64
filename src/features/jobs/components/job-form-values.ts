import type { z } from 'zod';
import type { createJobSchema, JobDetail } from '../../../../shared/api/jobs';

/** What the job form edits (the create schema's input). */
export type JobFormValues = z.input<typeof createJobSchema>;

/** Blank values of "New job": no overrides, so the plant's default loads apply. */
export const EMPTY_JOB: JobFormValues = {
  name: '',
  address: '',
  planRevision: '',
  criteria: { groundSnow: null, windUplift: null, exposureNotes: '', loads: {} },
};

/** A stored job as form values. */
export function jobFormValues(job: JobDetail): JobFormValues {
  return {
    name: job.name,
    address: job.address,
    planRevision: job.planRevision ?? '',
    criteria: {
      groundSnow: job.criteria.groundSnow ?? null,
      windUplift: job.criteria.windUplift ?? null,
      exposureNotes: job.criteria.exposureNotes ?? '',
      loads: { ...job.criteria.loads },
    },
  };
}
