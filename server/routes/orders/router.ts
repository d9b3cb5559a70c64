import { Router, type RequestHandler } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate, parseId } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { orderPolicy } from '../../policies/order';
import { linesMayChange } from '../../../shared/api/orders';
import {
  addLine,
  copyLine,
  createOrder,
  deleteLine,
  reorderLines,
  reviewLine,
  updateLine,
} from '../../commands/orders';
import { redesignWithJobLoads } from '../../commands/staleLines';
import { Order, type OrderLine } from '../../models';
import { conflict, notFound } from '../../errors';
import { presentLine, presentOrderSummary } from '../../presenters/order';
import { presentPage } from '../../presenters/page';
import { findJob } from '../jobs/router';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import { findLine, findOrder, orderAttributes, orderIncludes, orderPage } from './queries';
import {
  createLineSchema,
  createOrderSchema,
  orderListQuerySchema,
  reorderLinesSchema,
  reviewSchema,
  updateLineSchema,
  type OrderListQuery,
} from './schema';

const SORT = { number: 'number', createdAt: 'createdAt', updatedAt: 'updatedAt', status: 'status' };

/** load (second step): the line named by :lineId within the loaded order. */
const loadLine: RequestHandler = handle(async (req, res, next) => {
  const id = parseId(req.params.lineId);
  const line = id === null ? null : await findLine((res.locals.record as Order).id, id);
  if (!line) return next(notFound('Truss line'));
  res.locals.line = line;
  next();
});

/**
 * A draft order's lines change, and a quoted one's (the command turns it back to draft for a new
 * quote revision); any other status answers 409 with the reason.
 */
const requireDraft: RequestHandler = (_req, res, next) =>
  linesMayChange((res.locals.record as Order).status)
    ? next()
    : next(conflict('Only a draft or quoted order’s lines can change.'));

const order = load('Order', findOrder);

/** Orders, their truss lines and the design review of each line. */
export function ordersRouter() {
  const router = Router();

  router.get(
    '/',
    requireUser,
    validate(orderListQuerySchema, 'query'),
    authorize(orderPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as OrderListQuery;
      const like = q.q ? { [Op.iLike]: `%${q.q}%` } : null;
      const where = {
        [Op.and]: [
          orderPolicy.scope(req.user!),
          q.status ? { status: q.status } : {},
          q.customerId ? { customerId: q.customerId } : {},
          q.jobId ? { jobId: q.jobId } : {},
          like
            ? { [Op.or]: [{ number: like }, { '$job.name$': like }, { '$customer.name$': like }] }
            : {},
        ],
      };
      const { rows, count } = await Order.findAndCountAll({
        where,
        attributes: orderAttributes,
        include: orderIncludes,
        subQuery: false,
        distinct: true,
        order: orderFrom(q.sort, SORT, [['updatedAt', 'DESC']]),
        limit: q.pageSize,
        offset: (q.page - 1) * q.pageSize,
      });
      res.json(
        presentPage(
          rows.map((o) => presentOrderSummary(o as never)),
          count,
          q,
        ),
      );
    }),
  );

  router.post(
    '/',
    requireUser,
    validate(createOrderSchema),
    authorize(orderPolicy.create),
    handle(async (req, res) => {
      const job = await findJob(res.locals.body.jobId, req.user!);
      if (!job) throw notFound('Job');
      const created = await createOrder(req.user!, job);
      res.status(201).json(await orderPage(created.id, req.user!));
    }),
  );

  router.get(
    '/:id',
    requireUser,
    order,
    authorize(orderPolicy.show),
    handle(async (req, res) => {
      res.json(await orderPage(res.locals.record as Order, req.user!));
    }),
  );

  router.post(
    '/:id/lines',
    requireUser,
    validate(createLineSchema),
    order,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      const line = await addLine(req.user!, res.locals.record, res.locals.body);
      res.status(201).json(presentLine((await findLine(line.orderId, line.id))!));
    }),
  );

  router.post(
    '/:id/lines/reorder',
    requireUser,
    validate(reorderLinesSchema),
    order,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      await reorderLines(req.user!, res.locals.record, res.locals.body.lineIds);
      res.json(await orderPage((res.locals.record as Order).id, req.user!));
    }),
  );

  router.get(
    '/:id/lines/:lineId',
    requireUser,
    order,
    loadLine,
    authorize(orderPolicy.show),
    (_req, res) => {
      res.json(presentLine(res.locals.line));
    },
  );

  router.patch(
    '/:id/lines/:lineId',
    requireUser,
    validate(updateLineSchema),
    order,
    loadLine,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      const line = await updateLine(req.user!, res.locals.record, res.locals.line, res.locals.body);
      res.json(presentLine((await findLine(line.orderId, line.id))!));
    }),
  );

  router.delete(
    '/:id/lines/:lineId',
    requireUser,
    order,
    loadLine,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      await deleteLine(req.user!, res.locals.record, res.locals.line);
      res.status(204).end();
    }),
  );

  router.post(
    '/:id/lines/:lineId/copy',
    requireUser,
    order,
    loadLine,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      const copy = await copyLine(req.user!, res.locals.record, res.locals.line as OrderLine);
      res.status(201).json(presentLine((await findLine(copy.orderId, copy.id))!));
    }),
  );

  router.post(
    '/:id/lines/:lineId/redesign',
    requireUser,
    order,
    loadLine,
    authorize(orderPolicy.editLines),
    requireDraft,
    handle(async (req, res) => {
      const line = await redesignWithJobLoads(req.user!, res.locals.record, res.locals.line);
      res.json(presentLine((await findLine(line.orderId, line.id))!));
    }),
  );

  router.post(
    '/:id/lines/:lineId/review',
    requireUser,
    validate(reviewSchema),
    order,
    loadLine,
    authorize(orderPolicy.review),
    handle(async (req, res) => {
      const line = await reviewLine(req.user!, res.locals.record, res.locals.line, res.locals.body);
      // The line as stored now; deleted by a concurrent request since, the reviewed row itself.
      res.json(presentLine((await findLine(line.orderId, line.id)) ?? line));
    }),
  );

  return router;
}
