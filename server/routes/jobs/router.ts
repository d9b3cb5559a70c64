import { Router } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { jobPolicy } from '../../policies/job';
import { Customer, Job, type User } from '../../models';
import { presentJobSummary } from '../../presenters/job';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import { listQuerySchema } from './schema';
import type { ListQuery } from '../../../shared/api/list';

const withCustomer = [{ model: Customer, as: 'customer' }];
const SORT = { name: 'name', createdAt: 'createdAt', customerName: ['customer', 'name'] };

/** Building sites, scoped to the plant (and to the builder's company for builders). */
export function jobsRouter() {
  const router = Router();
  const findJob = (id: number, actor: User) =>
    Job.findOne({ where: { [Op.and]: [{ id }, jobPolicy.scope(actor)] }, include: withCustomer });

  router.get(
    '/',
    requireUser,
    validate(listQuerySchema, 'query'),
    authorize(jobPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as ListQuery;
      const where = {
        ...jobPolicy.scope(req.user!),
        ...(q.q
          ? {
              [Op.or]: [
                { name: { [Op.iLike]: `%${q.q}%` } },
                { address: { [Op.iLike]: `%${q.q}%` } },
                { '$customer.name$': { [Op.iLike]: `%${q.q}%` } },
              ],
            }
          : {}),
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

  router.get('/:id', requireUser, load('Job', findJob), authorize(jobPolicy.show), (_req, res) => {
    res.json(presentJobSummary(res.locals.record));
  });

  return router;
}
