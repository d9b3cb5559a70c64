import { Router, type Response } from 'express';
import { replanOrder } from '../../commands/shopPlans';
import { conflict } from '../../errors';
import { requireUser } from '../../middleware/auth';
import { OrderLine, Plant, type Order } from '../../models';
import { authorize } from '../../policies/predicates';
import { lumberPlanPolicy } from '../../policies/lumberPlan';
import { presentShopPlan } from '../../presenters/shopPlan';
import { lumberPlanCsv } from '../../services/lumberPlanCsv';
import { renderLumberPlanPdf } from '../../services/lumberPlanPdf';
import { noStoredPlan, storedPlanOf } from '../../services/shopPlan/current';
import { handle, load } from '../load';
import { findOrder } from '../orders/queries';

/** The order's plan status, refused (409) until every line's design is approved. */
async function statusOf(res: Response) {
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
  const { row, now } = await storedPlanOf(order, lines);
  return { status: presentShopPlan(order, row, now), row };
}

/** The stored plan for CSV and PDF (409 until the first one is made). */
async function storedPlan(res: Response) {
  const { status } = await statusOf(res);
  if (!status.plan) throw noStoredPlan('lumber plan', status.run);
  return { plan: status.plan, madeAt: status.madeAt, outOfDate: status.outOfDate };
}

/**
 * `GET /api/shop/orders/:id/lumber-plan` (the stored plan, its age and its run), `POST
 * …/lumber-plan/replan` (queue a new one), `…/lumber-plan.csv` and `…/lumber-plan.pdf`.
 */
export function lumberPlanRouter() {
  const router = Router();
  const guard = [requireUser, load('Order', findOrder), authorize(lumberPlanPolicy.show)];

  router.get(
    '/:id/lumber-plan',
    ...guard,
    handle(async (_req, res) => {
      res.set('Cache-Control', 'private, no-store').json((await statusOf(res)).status);
    }),
  );

  router.post(
    '/:id/lumber-plan/replan',
    requireUser,
    load('Order', findOrder),
    authorize(lumberPlanPolicy.replan),
    handle(async (req, res) => {
      await replanOrder(req.user!, res.locals.record as Order);
      res.status(202).json((await statusOf(res)).status);
    }),
  );

  router.get(
    '/:id/lumber-plan.csv',
    ...guard,
    handle(async (_req, res) => {
      const { plan } = await storedPlan(res);
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
      const { plan, madeAt, outOfDate } = await storedPlan(res);
      const pdf = await renderLumberPlanPdf(plan, {
        plantName: await plantName(res),
        madeAt,
        outOfDate,
      });
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
