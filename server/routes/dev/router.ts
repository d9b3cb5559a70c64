import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { authorize, hasRole } from '../../policies/predicates';
import { notFound } from '../../errors';
import type { Mailer } from '../../services/mail';

/** Demo-mode helpers: the local SMTP fake's inbox (plant manager only, only while the fake is in use). */
export function devRouter(mailer: Mailer | null) {
  const router = Router();
  router.get('/mail', requireUser, authorize(hasRole('admin')), (req, res, next) => {
    if (!mailer?.fake) return next(notFound('The local mail inbox'));
    // Each plant's manager sees only what their plant sent.
    res.json({ items: mailer.fake.messages(req.user!.plantId) });
  });
  return router;
}
