import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { presentPlant } from '../../presenters/plant';

/** The signed-in user's plant: name, units, demo mode and default design loads. */
export function plantRouter() {
  const router = Router();
  router.get('/', requireUser, (req, res) => {
    res.json(presentPlant(req.user!.plant!, req.app.locals.demo as boolean));
  });
  return router;
}
