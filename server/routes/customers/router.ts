import { Router } from 'express';
import { Op, literal } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { customerPolicy } from '../../policies/customer';
import { Customer, type User } from '../../models';
import { presentCustomerSummary } from '../../presenters/customer';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import { listQuerySchema } from './schema';
import type { ListQuery } from '../../../shared/api/list';

const jobCount = literal('(SELECT COUNT(*) FROM jobs WHERE jobs.customer_id = "Customer"."id")');
const SORT = { name: 'name', city: 'city', terms: 'terms', createdAt: 'createdAt' };

/** Builder companies of the plant. */
export function customersRouter() {
  const router = Router();
  const attributes = { include: [[jobCount, 'jobCount']] as [typeof jobCount, string][] };
  const findCustomer = (id: number, actor: User) =>
    Customer.findOne({ where: { [Op.and]: [{ id }, customerPolicy.scope(actor)] }, attributes });

  router.get(
    '/',
    requireUser,
    validate(listQuerySchema, 'query'),
    authorize(customerPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as ListQuery;
      const where = {
        ...customerPolicy.scope(req.user!),
        ...(q.q
          ? {
              [Op.or]: [
                { name: { [Op.iLike]: `%${q.q}%` } },
                { city: { [Op.iLike]: `%${q.q}%` } },
                { email: { [Op.iLike]: `%${q.q}%` } },
              ],
            }
          : {}),
      };
      const { rows, count } = await Customer.findAndCountAll({
        where,
        attributes,
        order: orderFrom(q.sort, SORT, [['name', 'ASC']]),
        limit: q.pageSize,
        offset: (q.page - 1) * q.pageSize,
      });
      res.json(presentPage(rows.map(presentCustomerSummary), count, q));
    }),
  );

  router.get(
    '/:id',
    requireUser,
    load('Builder company', findCustomer),
    authorize(customerPolicy.show),
    (_req, res) => {
      res.json(presentCustomerSummary(res.locals.record));
    },
  );

  return router;
}
