import type { LineTask, OrderTask, PlanTask } from '../../shared/api/tasks';
import type { Job, Order, OrderLine, StoredFile } from '../models';

const refs = (o: Order) => ({
  order: { id: o.id, number: o.number },
  job: { id: o.job!.id, name: o.job!.name },
  customer: { id: o.customer!.id, name: o.customer!.name },
});

/** A line that waits for someone: `note` is the reviewer's comment or the out-of-date reason. */
export function presentLineTask(l: OrderLine, note: string | null, at: Date): LineTask {
  return {
    lineId: l.id,
    mark: l.mark,
    description: l.description,
    ...refs(l.order!),
    designOk: l.designOk,
    note,
    at: at.toISOString(),
  };
}

/** A plan file uploaded lately, with its job and builder. */
export function presentPlanTask(
  f: StoredFile,
  job: Job & { customer?: { id: number; name: string } },
): PlanTask {
  return {
    fileId: f.id,
    name: f.originalName,
    job: { id: job.id, name: job.name },
    customer: { id: job.customer!.id, name: job.customer!.name },
    uploadedBy: f.uploader?.name ?? null,
    at: f.createdAt.toISOString(),
  };
}

/** An order the shop can work on. */
export function presentOrderTask(o: Order): OrderTask {
  return {
    ...refs(o),
    status: o.status,
    promisedOn: o.promisedOn ?? null,
    at: o.updatedAt.toISOString(),
  };
}
