import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { orderPolicy } from '../../policies/order';
import { computeDesign } from '../../services/design';

/** Stateless design: the same engine run as a save, nothing stored. */
export function designsRouter() {
  const router = Router();
  // Validation happens inside computeDesign with the shared designInputSchema (400 with field messages).
  router.post('/preview', requireUser, authorize(orderPolicy.preview), (req, res) => {
    const d = computeDesign(req.body, {}, '');
    res.json({ ...d.result, description: d.description });
  });
  return router;
}
