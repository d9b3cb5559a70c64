import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { orderPolicy } from '../../policies/order';
import { Customer, Job, Order, OrderLine, User } from '../../models';
import { presentQueueItem } from '../../presenters/order';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { reviewQueueQuerySchema, type ReviewQueueQuery } from './schema';

/** Designed lines waiting for (or past) the design reviewer; passing designs first, oldest first. */
export function reviewsRouter() {
  const router = Router();
  router.get(
    '/',
    requireUser,
    validate(reviewQueueQuerySchema, 'query'),
    authorize(orderPolicy.reviewQueue),
    handle(async (req, res) => {
      const q = res.locals.query as ReviewQueueQuery;
      const { rows, count } = await OrderLine.findAndCountAll({
        where: { reviewState: q.state },
        attributes: { exclude: ['designInput', 'designResult'] },
        include: [
          {
            model: Order,
            as: 'order',
            required: true,
            where: orderPolicy.scope(req.user!),
            include: [
              { model: Job, as: 'job' },
              { model: Customer, as: 'customer' },
            ],
          },
          { model: User, as: 'reviewer' },
        ],
        order: [
          ['designOk', 'DESC'],
          ['updatedAt', q.state === 'pending' ? 'ASC' : 'DESC'],
          ['id', 'ASC'],
        ],
        limit: q.pageSize,
        offset: (q.page - 1) * q.pageSize,
        distinct: true,
      });
      res.json(presentPage(rows.map(presentQueueItem), count, q));
    }),
  );
  // A review link without its order (typed, bookmarked, shared): which order the line is on.
  router.get(
    '/lines/:lineId',
    requireUser,
    authorize(orderPolicy.reviewQueue),
    load(
      'Truss line',
      (id, actor) =>
        OrderLine.findOne({
          where: { id },
          attributes: ['id', 'orderId'],
          include: [
            {
              model: Order,
              as: 'order',
              required: true,
              attributes: ['id'],
              where: orderPolicy.scope(actor),
            },
          ],
        }),
      'lineId',
    ),
    (_req, res) => {
      const line = res.locals.record as OrderLine;
      res.json({ lineId: line.id, orderId: line.orderId });
    },
  );
  return router;
}
