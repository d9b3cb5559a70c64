import { Router } from 'express';
import { updateDesignRulesSchema } from '../../../shared/api/plant';
import { saveDesignRules } from '../../commands/designRules';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { designRulesPolicy } from '../../policies/designRules';
import { authorize } from '../../policies/predicates';
import { designRulesOf } from '../../services/designRules';
import { Plant } from '../../models';
import { handle } from '../load';

/** `/api/plant/design-rules`: the engine options every design of the plant uses. */
export function designRulesRouter() {
  const router = Router();
  router.get(
    '/',
    requireUser,
    authorize(designRulesPolicy.show),
    handle(async (req, res) => {
      const plant = await Plant.findByPk(req.user!.plantId);
      res.json(designRulesOf(plant!));
    }),
  );
  router.put(
    '/',
    requireUser,
    validate(updateDesignRulesSchema),
    authorize(designRulesPolicy.update),
    handle(async (req, res) => {
      res.json(await saveDesignRules(req.user!, res.locals.body));
    }),
  );
  return router;
}
