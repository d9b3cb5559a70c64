import type { JobSummary } from '../../shared/api/list';
import type { Job } from '../models';

export function presentJobSummary(j: Job): JobSummary {
  return {
    id: j.id,
    name: j.name,
    address: j.address,
    customerId: j.customerId,
    customerName: j.customer?.name ?? '',
    planRevision: j.planRevision,
    createdAt: j.createdAt.toISOString(),
  };
}
