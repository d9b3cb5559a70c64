import { Router } from 'express';
import type { z } from 'zod';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { all, authorize, ownCompany, type Predicate } from '../../policies/predicates';
import { productionPolicy } from '../../policies/production';
import { holdOrder, releaseByHand, setPromisedDate } from '../../commands/release';
import { signOffDelivery } from '../../commands/progress';
import type { Order, User } from '../../models';
import { deliverySchema, holdSchema, promisedDateSchema } from '../../../shared/api/production';
import { handle, load } from '../load';
import { findOrder, orderPage } from '../orders/queries';

/** One production action on an order: its path, body, who may, and the command it runs. */
interface Action<S extends z.ZodType> {
  path: string;
  schema: S;
  may: Predicate<Order>;
  command: (actor: User, orderId: number, body: z.output<S>) => Promise<unknown>;
}
const action = <S extends z.ZodType>(a: Action<S>) => a as unknown as Action<z.ZodType>;

/** Every body names the order's version the user saw (409 `stale` when it moved on). */
const ACTIONS = [
  action({
    path: 'promised-date',
    schema: promisedDateSchema,
    may: productionPolicy.promise,
    command: setPromisedDate,
  }),
  action({
    path: 'hold',
    schema: holdSchema,
    may: productionPolicy.holdOrRelease,
    command: holdOrder,
  }),
  action({
    path: 'release',
    schema: holdSchema,
    may: productionPolicy.holdOrRelease,
    command: releaseByHand,
  }),
  action({
    path: 'delivery',
    schema: deliverySchema,
    may: productionPolicy.signOffDelivery,
    command: signOffDelivery,
  }),
];

/**
 * An order's production actions (`POST /api/orders/:id/<path>`): promised date, hold, release by
 * hand, delivery sign-off. Each answers the order page as the user now sees it.
 */
export function orderProductionRouter() {
  const router = Router();
  const order = load('Order', findOrder);
  for (const a of ACTIONS)
    router.post(
      `/:id/${a.path}`,
      requireUser,
      validate(a.schema),
      order,
      authorize(all<Order>(a.may, ownCompany)),
      handle(async (req, res) => {
        const id = (res.locals.record as Order).id;
        await a.command(req.user!, id, res.locals.body);
        res.json(await orderPage(id, req.user!));
      }),
    );
  return router;
}
