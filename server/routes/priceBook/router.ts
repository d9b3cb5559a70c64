import { Router } from 'express';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { priceBookPolicy } from '../../policies/priceBook';
import { findPriceBook, savePriceBook } from '../../commands/priceBook';
import { presentPriceBook } from '../../presenters/quote';
import { DEMO_PRICE_BOOK } from '../../services/pricing';
import { handle } from '../load';
import { priceBookSchema } from './schema';

/** The plant's price book: read by the desk, written by the plant manager. */
export function priceBookRouter() {
  const router = Router();

  router.get(
    '/',
    requireUser,
    authorize(priceBookPolicy.show),
    handle(async (req, res) => {
      res.json(presentPriceBook(await findPriceBook(req.user!.plantId), DEMO_PRICE_BOOK));
    }),
  );

  router.put(
    '/',
    requireUser,
    validate(priceBookSchema),
    authorize(priceBookPolicy.update),
    handle(async (req, res) => {
      await savePriceBook(req.user!, res.locals.body);
      res.json(presentPriceBook(await findPriceBook(req.user!.plantId), DEMO_PRICE_BOOK));
    }),
  );

  return router;
}
