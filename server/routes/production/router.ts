import { Router } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { productionPolicy } from '../../policies/production';
import { orderPolicy } from '../../policies/order';
import { saveSettings, settingsFor } from '../../commands/productionSettings';
import { moveOrder, plantToday, replanAndTell } from '../../commands/schedule';
import { Order } from '../../models';
import { notFound } from '../../errors';
import { presentSchedule } from '../../presenters/schedule';
import { addCalendarDays } from '../../../shared/engine/schedule';
import {
  moveSchema,
  productionSettingsSchema,
  scheduleQuerySchema,
} from '../../../shared/api/production';
import { handle } from '../load';

/** Production settings (`/api/production/settings`) and the schedule (`/api/schedule`). */
export function productionRouter() {
  const router = Router();

  router.get(
    '/production/settings',
    requireUser,
    authorize(productionPolicy.readSettings),
    handle(async (req, res) => {
      const s = await settingsFor(req.user!.plantId);
      res.json({ ...s, updatedAt: s.updatedAt?.toISOString() ?? null });
    }),
  );

  router.put(
    '/production/settings',
    requireUser,
    validate(productionSettingsSchema),
    authorize(productionPolicy.writeSettings),
    handle(async (req, res) => {
      await Order.sequelize!.transaction(async (t) => {
        await saveSettings(req.user!, res.locals.body, t);
        await replanAndTell(t, req.user!.plantId);
      });
      const s = await settingsFor(req.user!.plantId);
      res.json({ ...s, updatedAt: s.updatedAt?.toISOString() ?? null });
    }),
  );

  router.get(
    '/schedule',
    requireUser,
    validate(scheduleQuerySchema, 'query'),
    authorize(productionPolicy.readSchedule),
    handle(async (req, res) => {
      const q = res.locals.query as { from?: string; days: number };
      const from = q.from ?? plantToday();
      res.json(await presentSchedule(req.user!.plantId, from, addCalendarDays(from, q.days - 1)));
    }),
  );

  router.post(
    '/schedule/moves',
    requireUser,
    validate(moveSchema),
    authorize(productionPolicy.move),
    handle(async (req, res) => {
      const body = res.locals.body as { orderId: number; tableId: number; date: string };
      const order = await Order.findOne({
        where: { [Op.and]: [{ id: body.orderId }, orderPolicy.scope(req.user!)] },
      });
      if (!order) throw notFound('Order');
      const { plan } = await moveOrder(req.user!, order, {
        tableId: body.tableId,
        date: body.date,
      });
      const mine = plan.orders.find((o) => o.orderId === order.id);
      res.json({
        orderId: order.id,
        late: mine?.late ?? false,
        plannedFinishOn: mine?.canMakeOn ?? null,
        promisedOn: order.promisedOn,
      });
    }),
  );

  return router;
}
