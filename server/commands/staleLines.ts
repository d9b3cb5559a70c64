import { Op, type Transaction } from 'sequelize';
import {
  describeLoadChange,
  designUsesJobLoads,
  withJobLoads,
  type JobDesignLoads,
} from '../../shared/api/jobLoads';
import { Job, Order, OrderLine, Plant, type User } from '../models';
import { jobDesignLoadsOf } from '../presenters/plant';
import { computeDesign } from '../services/design';
import { loadDesignRules } from '../services/designRules';
import { orderEvent } from './audit';
import { designColumns, lockOrder } from './orders';

/** Orders whose lines still matter to the shop: everything not cancelled or delivered. */
const OPEN = { [Op.notIn]: ['cancelled', 'delivered'] };

/**
 * After a job's loads change, mark every line of its open orders that was designed with other
 * loads as out of date (approved and quoted ones too: the approval was of other loads). A line
 * whose loads now match again is cleared. One history entry per order names the marks.
 */
export async function markStaleLines(
  t: Transaction,
  actor: User,
  job: Job,
  before: JobDesignLoads,
  after: JobDesignLoads,
  unit: string,
) {
  const change = describeLoadChange(before, after, unit);
  if (!change) return;
  const orders = await Order.findAll({
    where: { jobId: job.id, status: OPEN },
    order: [['id', 'ASC']],
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  for (const order of orders) {
    const lines = await OrderLine.findAll({
      where: { orderId: order.id },
      order: [['id', 'ASC']],
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    const stale: string[] = [];
    for (const line of lines) {
      const current = designUsesJobLoads(line.designInput, after);
      if (current && line.loadsOutOfDate) {
        await line.update({ loadsOutOfDate: false, outOfDateReason: null }, { transaction: t });
      } else if (!current) {
        stale.push(line.mark);
        await line.update(
          { loadsOutOfDate: true, outOfDateReason: `Job loads changed: ${change}.` },
          { transaction: t },
        );
      }
    }
    if (stale.length)
      await orderEvent(t, actor, order, 'lines.out_of_date', { marks: stale, change });
  }
}

/** The job's current loads, in the plant's units. */
export async function currentJobLoads(job: Job, t?: Transaction) {
  const plant = await Plant.findByPk(job.plantId, { transaction: t });
  return { loads: jobDesignLoadsOf(plant!, job.criteria ?? {}), units: plant!.units };
}

/**
 * One-click redesign of a line with its job's current loads: the same geometry and lumber choices,
 * a fresh design by the current engine, a new review (an earlier approval was of other loads).
 */
export async function redesignWithJobLoads(actor: User, order: Order, line: OrderLine) {
  const job = await Job.findByPk(order.jobId);
  const { loads } = await currentJobLoads(job!);
  const design = computeDesign(
    withJobLoads(line.designInput, loads),
    { plies: line.plies },
    undefined,
    await loadDesignRules(order.plantId),
  );
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    const locked = await OrderLine.findByPk(line.id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!locked) throw new Error('line vanished under lock');
    const wasApproved = locked.reviewState === 'approved';
    await locked.update(
      {
        ...designColumns(design),
        designVersion: locked.designVersion + 1,
        reviewState: 'pending',
        reviewComment: null,
        reviewedBy: null,
        reviewedAt: null,
      },
      { transaction: t },
    );
    await orderEvent(t, actor, order, 'line.redesigned', {
      lineId: locked.id,
      mark: locked.mark,
      reason: line.outOfDateReason ?? 'Redesigned with the job’s current loads.',
      wasApproved,
      ok: locked.designOk,
    });
    return locked;
  });
}
