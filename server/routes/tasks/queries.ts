import { Op, type WhereOptions } from 'sequelize';
import { NEW_PLAN_DAYS, TASKS_PER_LIST } from '../../../shared/api/tasks';
import { Customer, Job, Order, OrderLine, StoredFile, User } from '../../models';
import { orderPolicy } from '../../policies/order';
import { presentLineTask, presentOrderTask, presentPlanTask } from '../../presenters/tasks';

/** Orders still being worked on: a line of a cancelled or delivered order waits for nobody. */
const OPEN = { status: { [Op.notIn]: ['cancelled', 'delivered'] } };

const lineList = async (
  actor: User,
  where: WhereOptions,
  note: (l: OrderLine) => string | null,
  at: (l: OrderLine) => Date,
  order: [string, string][],
) => {
  const { rows, count } = await OrderLine.findAndCountAll({
    where,
    attributes: { exclude: ['designInput', 'designResult'] },
    include: [
      {
        model: Order,
        as: 'order',
        required: true,
        where: { [Op.and]: [orderPolicy.scope(actor), OPEN] },
        include: [
          { model: Job, as: 'job' },
          { model: Customer, as: 'customer' },
        ],
      },
    ],
    order: [...order, ['id', 'ASC']],
    limit: TASKS_PER_LIST,
    distinct: true,
  });
  return { items: rows.map((l) => presentLineTask(l, note(l), at(l))), total: count };
};

/** Lines the reviewer sent back to the desk, most recent first. */
export const sentBack = (actor: User) =>
  lineList(
    actor,
    { reviewState: 'returned' },
    (l) => l.reviewComment,
    (l) => l.reviewedAt ?? l.updatedAt,
    [['reviewedAt', 'DESC']],
  );

/** Lines designed with loads the job no longer has. */
export const outOfDate = (actor: User) =>
  lineList(
    actor,
    { loadsOutOfDate: true },
    (l) => l.outOfDateReason,
    (l) => l.updatedAt,
    [['updatedAt', 'DESC']],
  );

/** Designs waiting for review, in the queue's order (passing designs first, oldest first). */
export const waitingReview = (actor: User) =>
  lineList(
    actor,
    { reviewState: 'pending' },
    () => null,
    (l) => l.updatedAt,
    [
      ['designOk', 'DESC'],
      ['updatedAt', 'ASC'],
    ],
  );

/** Plans uploaded in the last days by someone else, newest first. */
export async function newPlans(actor: User) {
  const since = new Date(Date.now() - NEW_PLAN_DAYS * 24 * 3600 * 1000);
  const { rows, count } = await StoredFile.findAndCountAll({
    where: {
      plantId: actor.plantId,
      createdAt: { [Op.gte]: since },
      [Op.or]: [{ uploadedBy: null }, { uploadedBy: { [Op.ne]: actor.id } }],
    },
    include: [{ model: User, as: 'uploader' }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: TASKS_PER_LIST,
  });
  const jobs = await Job.findAll({
    where: { plantId: actor.plantId, id: [...new Set(rows.map((f) => f.jobId))] },
    include: [{ model: Customer, as: 'customer' }],
  });
  const byId = new Map(jobs.map((j) => [j.id, j]));
  return {
    items: rows.filter((f) => byId.has(f.jobId)).map((f) => presentPlanTask(f, byId.get(f.jobId)!)),
    total: count,
  };
}

/** Orders released to the shop or being built, earliest promised date first. */
export async function releasedToShop(actor: User) {
  const { rows, count } = await Order.findAndCountAll({
    where: {
      [Op.and]: [orderPolicy.scope(actor), { status: ['released', 'in_production'] }],
    },
    include: [
      { model: Job, as: 'job' },
      { model: Customer, as: 'customer' },
    ],
    order: [
      ['promisedOn', 'ASC NULLS LAST'],
      ['id', 'ASC'],
    ],
    limit: TASKS_PER_LIST,
  });
  return { items: rows.map(presentOrderTask), total: count };
}
