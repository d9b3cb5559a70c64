import type { JobSummary } from '../../shared/api/list';
import type { JobDetail } from '../../shared/api/jobs';
import type { Job, Order, Plant } from '../models';
import { plantDefaultLoads } from './plant';

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

/** A job's page: criteria, the loads a new truss starts from, and its orders. */
export function presentJob(
  j: Job,
  plant: Plant,
  orders: (Order & { get(k: 'lineCount'): unknown })[],
): JobDetail {
  const criteria = j.criteria ?? {};
  const loads = Object.fromEntries(
    Object.entries(criteria.loads ?? {}).filter(([, v]) => v !== undefined && v !== null),
  );
  return {
    id: j.id,
    name: j.name,
    address: j.address,
    planRevision: j.planRevision,
    customer: { id: j.customer!.id, name: j.customer!.name },
    criteria,
    effectiveLoads: { ...plantDefaultLoads(plant), ...loads },
    units: plant.units,
    orders: orders.map((o) => ({
      id: o.id,
      number: o.number,
      status: o.status,
      lineCount: Number(o.get('lineCount') ?? 0),
    })),
    createdAt: j.createdAt.toISOString(),
  };
}
