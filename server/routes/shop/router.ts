import { Router, type RequestHandler, type Response } from 'express';
import { replanOrder } from '../../commands/shopPlans';
import type { CutListFormat, CutListQuery } from '../../../shared/api/shop';
import { conflict } from '../../errors';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import type { Order, OrderLine } from '../../models';
import { authorize } from '../../policies/predicates';
import { shopPolicy } from '../../policies/shop';
import { presentCutListStatus } from '../../presenters/shopPlan';
import { cutListCsv } from '../../services/cutList';
import { renderCutListPdf } from '../../services/cutListPdf';
import { noStoredPlan, storedPlanOf } from '../../services/shopPlan/current';
import { findOrder } from '../orders/queries';
import { handle, load } from '../load';
import { linesForShop, presentShopOrder, readyOrders } from './queries';
import { cutListQuerySchema } from './schema';

const order = load('Order', findOrder);

/** load (second step): the order's lines; the shop sees an order only once every design is approved. */
const requireApproved: RequestHandler = handle(async (_req, res, next) => {
  const lines = await linesForShop((res.locals.record as Order).id);
  if (lines.length === 0) return next(conflict('This order has no truss lines to cut.'));
  const waiting = lines.filter((l) => l.reviewState !== 'approved');
  if (waiting.length > 0) {
    return next(
      conflict(
        `The shop gets this order once every design is approved; still waiting: ${waiting
          .map((l) => l.mark)
          .join(', ')}.`,
      ),
    );
  }
  res.locals.lines = lines;
  next();
});

/** The order's stored cut list (never computed here: the shop-plan job makes it) and its run. */
async function cutListStatus(res: Response) {
  const o = res.locals.record as Order;
  const { row, now } = await storedPlanOf(o, res.locals.lines as OrderLine[]);
  return presentCutListStatus(presentShopOrder(o), row, now);
}

const formatOf = (path: string, query: CutListQuery): CutListFormat =>
  path.endsWith('.csv') ? 'csv' : path.endsWith('.pdf') ? 'pdf' : query.format;

/**
 * Shop paper: the orders ready for the saw and each order's stored cut list (JSON with its run,
 * CSV, PDF), and `POST …/cut-list/replan` to make a new one.
 */
export function shopRouter() {
  const router = Router();

  router.get(
    '/orders',
    requireUser,
    authorize(shopPolicy.list),
    handle(async (req, res) => {
      const list = await readyOrders(req.user!);
      res.json({ items: list.map(presentShopOrder) });
    }),
  );

  router.get(
    ['/orders/:id/cut-list', '/orders/:id/cut-list.csv', '/orders/:id/cut-list.pdf'],
    requireUser,
    validate(cutListQuerySchema, 'query'),
    order,
    authorize(shopPolicy.cutList),
    requireApproved,
    handle(async (req, res) => {
      const status = await cutListStatus(res);
      const format = formatOf(req.path, res.locals.query as CutListQuery);
      res.set('Cache-Control', 'private, no-store');
      if (format === 'json') return void res.json(status);
      const view = status.cutList;
      if (!view) throw noStoredPlan('cut list', status.run);
      const name = `cut-list-${view.order.number.replace(/[^A-Za-z0-9_-]/g, '-')}`;
      if (format === 'csv') {
        res
          .type('text/csv; charset=utf-8')
          .set('Content-Disposition', `attachment; filename="${name}.csv"`)
          .send(cutListCsv(view));
      } else {
        res
          .type('application/pdf')
          .set('Content-Disposition', `inline; filename="${name}.pdf"`)
          .send(await renderCutListPdf(view, { outOfDate: status.outOfDate }));
      }
    }),
  );

  router.post(
    '/orders/:id/cut-list/replan',
    requireUser,
    order,
    authorize(shopPolicy.replan),
    requireApproved,
    handle(async (req, res) => {
      await replanOrder(req.user!, res.locals.record as Order);
      res.status(202).json(await cutListStatus(res));
    }),
  );

  return router;
}
