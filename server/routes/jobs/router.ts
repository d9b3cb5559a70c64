import { Router } from 'express';
import { Op, literal } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { jobPolicy } from '../../policies/job';
import { orderPolicy } from '../../policies/order';
import { updateJob } from '../../commands/customers';
import { Customer, Job, Order, Plant, type User } from '../../models';
import { presentJob, presentJobSummary } from '../../presenters/job';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import { jobListQuerySchema, updateJobSchema, type JobListQuery } from './schema';

const withCustomer = [{ model: Customer, as: 'customer' }];
const SORT = { name: 'name', createdAt: 'createdAt', customerName: ['customer', 'name'] };
const lineCount = literal(
  '(SELECT COUNT(*) FROM order_lines WHERE order_lines.order_id = "Order"."id")',
);

/** Find a job within the actor's scope. */
export const findJob = (id: number, actor: User) =>
  Job.findOne({ where: { [Op.and]: [{ id }, jobPolicy.scope(actor)] }, include: withCustomer });

async function jobPage(job: Job, actor: User) {
  const [plant, orders] = await Promise.all([
    Plant.findByPk(job.plantId),
    Order.findAll({
      where: { [Op.and]: [{ jobId: job.id }, orderPolicy.scope(actor)] },
      attributes: { include: [[lineCount, 'lineCount']] },
      order: [['createdAt', 'DESC']],
    }),
  ]);
  return presentJob(job, plant!, orders as never);
}

/** Building sites, scoped to the plant (and to the builder's company for builders). */
export function jobsRouter() {
  const router = Router();

  router.get(
    '/',
    requireUser,
    validate(jobListQuerySchema, 'query'),
    authorize(jobPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as JobListQuery;
      const like = q.q ? { [Op.iLike]: `%${q.q}%` } : null;
      const where = {
        [Op.and]: [
          jobPolicy.scope(req.user!),
          q.customerId ? { customerId: q.customerId } : {},
          like ? { [Op.or]: [{ name: like }, { address: like }, { '$customer.name$': like }] } : {},
        ],
      };
      const { rows, count } = await Job.findAndCountAll({
        where,
        include: withCustomer,
        order: orderFrom(q.sort, SORT, [['createdAt', 'DESC']]),
        limit: q.pageSize,
        offset: (q.page - 1) * q.pageSize,
        subQuery: false,
      });
      res.json(presentPage(rows.map(presentJobSummary), count, q));
    }),
  );

  router.get(
    '/:id',
    requireUser,
    load('Job', findJob),
    authorize(jobPolicy.show),
    handle(async (req, res) => {
      res.json(await jobPage(res.locals.record, req.user!));
    }),
  );

  router.patch(
    '/:id',
    requireUser,
    validate(updateJobSchema),
    load('Job', findJob),
    authorize(jobPolicy.update),
    handle(async (req, res) => {
      const job = await updateJob(req.user!, res.locals.record, res.locals.body);
      res.json(await jobPage(job, req.user!));
    }),
  );

  return router;
}
