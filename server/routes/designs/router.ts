import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { orderPolicy } from '../../policies/order';
import { computeDesign } from '../../services/design';
import { loadDesignRules } from '../../services/designRules';
import { compareProfiles } from '../../services/compare';
import { pricesFor } from '../../commands/priceBook';
import { priceBookPolicy } from '../../policies/priceBook';
import { handle } from '../load';

/** Stateless design: the same engine run as a save, nothing stored. */
export function designsRouter() {
  const router = Router();
  // Validation happens inside computeDesign with the shared designInputSchema (400 with field messages).
  router.post(
    '/preview',
    requireUser,
    authorize(orderPolicy.preview),
    handle(async (req, res) => {
      const d = computeDesign(req.body, {}, '', await loadDesignRules(req.user!.plantId));
      res.json({ ...d.result, description: d.description, designRules: d.rules });
    }),
  );
  // Every profile that fits the same span, pitch and loads; prices only for roles that see them.
  router.post(
    '/compare',
    requireUser,
    authorize(orderPolicy.preview),
    handle(async (req, res) => {
      const seesPrices = priceBookPolicy.show(req.user!, null);
      const prices = seesPrices ? await pricesFor(req.user!.plantId) : null;
      res.json(
        compareProfiles(
          req.body,
          prices?.book ?? null,
          prices?.demo ?? false,
          await loadDesignRules(req.user!.plantId),
        ),
      );
    }),
  );
  return router;
}
