import { Router } from 'express';
import type { Tasks } from '../../../shared/api/tasks';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { tasksPolicy } from '../../policies/tasks';
import { handle } from '../load';
import { newPlans, outOfDate, releasedToShop, sentBack, waitingReview } from './queries';

const FILL = { sentBack, outOfDate, waitingReview, newPlans, releasedToShop };

/** `GET /api/tasks`: the home page's task lists of the signed-in staff member's role. */
export function tasksRouter() {
  const router = Router();
  router.get(
    '/',
    requireUser,
    authorize(tasksPolicy.show),
    handle(async (req, res) => {
      const actor = req.user!;
      const names = (Object.keys(FILL) as (keyof typeof FILL)[]).filter((n) =>
        tasksPolicy.lists[n](actor, undefined),
      );
      const lists = await Promise.all(names.map((n) => FILL[n](actor)));
      const tasks: Tasks = Object.fromEntries(names.map((n, i) => [n, lists[i]]));
      res.json(tasks);
    }),
  );
  return router;
}
