import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { portalPolicy } from '../../policies/portal';
import { acceptQuote, requestChanges } from '../../commands/acceptance';
import type { Quote } from '../../models';
import { findOrder } from '../orders/queries';
import { orderPage } from '../orders/queries';
import { loadQuote } from '../quotes/router';
import { handle, load } from '../load';
import { acceptQuoteSchema, requestChangesSchema } from '../../../shared/api/portal';

const order = load('Order', findOrder);

/** `/api/orders/:id/quotes/:number/…`: the builder accepts a revision or asks for changes. */
export function acceptanceRouter() {
  const router = Router({ mergeParams: true });

  router.post(
    '/:number/accept',
    requireUser,
    validate(acceptQuoteSchema),
    order,
    loadQuote,
    authorize(portalPolicy.accept),
    handle(async (req, res) => {
      await acceptQuote(
        req.user!,
        res.locals.record,
        res.locals.quote as Quote,
        res.locals.body,
        req.ip ?? null,
      );
      res.json(await orderPage(res.locals.record.id, req.user!));
    }),
  );

  router.post(
    '/:number/changes',
    requireUser,
    validate(requestChangesSchema),
    order,
    loadQuote,
    authorize(portalPolicy.requestChanges),
    handle(async (req, res) => {
      await requestChanges(
        req.user!,
        res.locals.record,
        res.locals.quote as Quote,
        res.locals.body,
      );
      res.status(201).json(await orderPage(res.locals.record.id, req.user!));
    }),
  );

  return router;
}
