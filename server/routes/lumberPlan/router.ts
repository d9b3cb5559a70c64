import { Router, type Response } from 'express';
import { stockFor } from '../../commands/stockSettings';
import { conflict } from '../../errors';
import { requireUser } from '../../middleware/auth';
import { OrderLine, Plant, type Order } from '../../models';
import { authorize } from '../../policies/predicates';
import { lumberPlanPolicy } from '../../policies/lumberPlan';
import { lumberPlanCsv } from '../../services/lumberPlanCsv';
import { lumberPlanFor } from '../../services/lumberPlan';
import { orderCutList } from '../../services/cutList';
import { renderLumberPlanPdf } from '../../services/lumberPlanPdf';
import { handle, load } from '../load';
import { findOrder } from '../orders/queries';

/** The order's plan, refused (409) until every line's design is approved. */
async function planOf(res: Response) {
  const order = res.locals.record as Order;
  const lines = await OrderLine.findAll({
    where: { orderId: order.id },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  if (lines.length === 0 || lines.some((l) => l.reviewState !== 'approved')) {
    throw conflict('The lumber plan is ready once every line’s design is approved.');
  }
  return lumberPlanFor(order, orderCutList(lines), await stockFor(order.plantId));
}

/** `GET /api/shop/orders/:id/lumber-plan` (JSON), `…/lumber-plan.csv` and `…/lumber-plan.pdf`. */
export function lumberPlanRouter() {
  const router = Router();
  const guard = [requireUser, load('Order', findOrder), authorize(lumberPlanPolicy.show)];

  router.get(
    '/:id/lumber-plan',
    ...guard,
    handle(async (_req, res) => {
      res.json(await planOf(res));
    }),
  );

  router.get(
    '/:id/lumber-plan.csv',
    ...guard,
    handle(async (_req, res) => {
      const plan = await planOf(res);
      res
        .type('text/csv; charset=utf-8')
        .set('Content-Disposition', `attachment; filename="lumber-plan-${plan.orderNumber}.csv"`)
        .send(lumberPlanCsv(plan));
    }),
  );

  router.get(
    '/:id/lumber-plan.pdf',
    ...guard,
    handle(async (_req, res) => {
      const plan = await planOf(res);
      const pdf = await renderLumberPlanPdf(plan, { plantName: await plantName(res) });
      res
        .type('application/pdf')
        .set('Content-Disposition', `inline; filename="lumber-plan-${plan.orderNumber}.pdf"`)
        .set('Cache-Control', 'no-store')
        .send(pdf);
    }),
  );

  return router;
}

async function plantName(res: Response) {
  const plant = await Plant.findByPk((res.locals.record as Order).plantId);
  return plant?.name ?? '';
}
