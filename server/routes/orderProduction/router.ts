import { Router } from 'express';
import { z } from 'zod';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { all, authorize, ownCompany } from '../../policies/predicates';
import { productionPolicy } from '../../policies/production';
import { holdOrder, releaseByHand, setPromisedDate } from '../../commands/release';
import { signOffDelivery } from '../../commands/progress';
import type { Order } from '../../models';
import { holdSchema, promisedDateSchema } from '../../../shared/api/production';
import { handle, load } from '../load';
import { findOrder, orderPage } from '../orders/queries';

const order = load('Order', findOrder);
const deliverySchema = z.object({
  receivedBy: z.string().trim().min(2, 'Who signed for the delivery?').max(120),
});

/** An order's production actions: promised date, hold, release by hand, delivery sign-off. */
export function orderProductionRouter() {
  const router = Router();
  const mailer = (req: { app: { locals: Record<string, unknown> } }) =>
    (req.app.locals.mailer as never) ?? null;
  const page = async (req: Parameters<Parameters<typeof handle>[0]>[0], id: number) =>
    orderPage(id, req.user!);

  router.post(
    '/:id/promised-date',
    requireUser,
    validate(promisedDateSchema),
    order,
    authorize(all<Order>(productionPolicy.promise, ownCompany)),
    handle(async (req, res) => {
      const id = (res.locals.record as Order).id;
      await setPromisedDate(req.user!, id, res.locals.body, mailer(req));
      res.json(await page(req, id));
    }),
  );

  router.post(
    '/:id/hold',
    requireUser,
    validate(holdSchema),
    order,
    authorize(all<Order>(productionPolicy.holdOrRelease, ownCompany)),
    handle(async (req, res) => {
      const id = (res.locals.record as Order).id;
      await holdOrder(req.user!, id, res.locals.body.reason, mailer(req));
      res.json(await page(req, id));
    }),
  );

  router.post(
    '/:id/release',
    requireUser,
    validate(holdSchema),
    order,
    authorize(all<Order>(productionPolicy.holdOrRelease, ownCompany)),
    handle(async (req, res) => {
      const id = (res.locals.record as Order).id;
      await releaseByHand(req.user!, id, res.locals.body.reason, mailer(req));
      res.json(await page(req, id));
    }),
  );

  router.post(
    '/:id/delivery',
    requireUser,
    validate(deliverySchema),
    order,
    authorize(all<Order>(productionPolicy.signOffDelivery, ownCompany)),
    handle(async (req, res) => {
      const id = (res.locals.record as Order).id;
      await signOffDelivery(req.user!, id, res.locals.body.receivedBy);
      res.json(await page(req, id));
    }),
  );

  return router;
}
