import { Router } from 'express';
import { DEMO_STOCK_SETTINGS } from '../../../shared/api/stock';
import { findStockSettings, saveStockSettings } from '../../commands/stockSettings';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { stockSettingsPolicy } from '../../policies/stockSettings';
import { presentStockSettings } from '../../presenters/stockSettings';
import { handle } from '../load';
import { stockSettingsSchema } from './schema';

/** The plant's lumber stock settings: read by the shop and the desk, written by the manager. */
export function stockRouter() {
  const router = Router();

  router.get(
    '/',
    requireUser,
    authorize(stockSettingsPolicy.show),
    handle(async (req, res) => {
      const stored = await findStockSettings(req.user!.plantId);
      res.json(presentStockSettings(stored, DEMO_STOCK_SETTINGS));
    }),
  );

  router.put(
    '/',
    requireUser,
    validate(stockSettingsSchema),
    authorize(stockSettingsPolicy.update),
    handle(async (req, res) => {
      await saveStockSettings(req.user!, res.locals.body);
      const stored = await findStockSettings(req.user!.plantId);
      res.json(presentStockSettings(stored, DEMO_STOCK_SETTINGS));
    }),
  );

  return router;
}
