import { Router } from 'express';
import { Op, literal } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { customerPolicy } from '../../policies/customer';
import { createCustomer, createJob, updateCustomer } from '../../commands/customers';
import { Customer, Job, Plant, type User } from '../../models';
import { presentCustomer, presentCustomerSummary } from '../../presenters/customer';
import { presentJob } from '../../presenters/job';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import {
  createCustomerSchema,
  createJobSchema,
  customerListQuerySchema,
  updateCustomerSchema,
  type CustomerListQuery,
} from './schema';

const jobCount = literal('(SELECT COUNT(*) FROM jobs WHERE jobs.customer_id = "Customer"."id")');
const SORT = { name: 'name', city: 'city', terms: 'terms', createdAt: 'createdAt' };
const attributes = { include: [[jobCount, 'jobCount']] as [typeof jobCount, string][] };

/** Find a company within the actor's scope (with its job count). */
export const findCustomer = (id: number, actor: User) =>
  Customer.findOne({ where: { [Op.and]: [{ id }, customerPolicy.scope(actor)] }, attributes });

/** Builder companies of the plant, and their jobs. */
export function customersRouter() {
  const router = Router();

  router.get(
    '/',
    requireUser,
    validate(customerListQuerySchema, 'query'),
    authorize(customerPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as CustomerListQuery;
      const like = q.q ? { [Op.iLike]: `%${q.q}%` } : null;
      const where = {
        ...customerPolicy.scope(req.user!),
        ...(q.terms ? { terms: q.terms } : {}),
        ...(like ? { [Op.or]: [{ name: like }, { city: like }, { email: like }] } : {}),
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

  router.post(
    '/',
    requireUser,
    validate(createCustomerSchema),
    authorize(customerPolicy.create),
    handle(async (req, res) => {
      const customer = await createCustomer(req.user!, res.locals.body);
      res.status(201).json(presentCustomer((await findCustomer(customer.id, req.user!))!));
    }),
  );

  router.get(
    '/:id',
    requireUser,
    load('Builder company', findCustomer),
    authorize(customerPolicy.show),
    (_req, res) => {
      res.json(presentCustomer(res.locals.record));
    },
  );

  router.patch(
    '/:id',
    requireUser,
    validate(updateCustomerSchema),
    load('Builder company', findCustomer),
    authorize(customerPolicy.update),
    handle(async (req, res) => {
      const c = await updateCustomer(req.user!, res.locals.record, res.locals.body);
      res.json(presentCustomer((await findCustomer(c.id, req.user!))!));
    }),
  );

  router.post(
    '/:id/jobs',
    requireUser,
    validate(createJobSchema),
    load('Builder company', findCustomer),
    authorize(customerPolicy.addJob),
    handle(async (req, res) => {
      const customer = res.locals.record as Customer;
      const job = await createJob(req.user!, customer, res.locals.body);
      const full = await Job.findByPk(job.id, { include: [{ model: Customer, as: 'customer' }] });
      const plant = await Plant.findByPk(customer.plantId);
      res.status(201).json(presentJob(full!, plant!, []));
    }),
  );

  return router;
}
