import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { presentMe } from '../../presenters/user';

/** The signed-in user's plant (name, units, demo mode). */
export function plantRouter() {
  const router = Router();
  router.get('/', requireUser, (req, res) => {
    res.json(presentMe(req.user!).plant);
  });
  return router;
}
