import { Router } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { userPolicy } from '../../policies/user';
import { createUser, updateUser } from '../../commands/users';
import { Customer, User } from '../../models';
import { presentUser } from '../../presenters/user';
import { presentPage } from '../../presenters/page';
import { handle, load } from '../load';
import { orderFrom } from '../sorting';
import { createUserSchema, listQuerySchema, updateUserSchema } from './schema';
import type { ListQuery } from '../../../shared/api/list';

const withCustomer = [{ model: Customer, as: 'customer' }];
const SORT = {
  name: 'name',
  email: 'email',
  role: 'role',
  createdAt: 'createdAt',
  lastSignInAt: 'lastSignInAt',
};

/** The plant manager's user administration. */
export function usersRouter() {
  const router = Router();
  const findUser = (id: number, actor: User) =>
    User.findOne({ where: { [Op.and]: [{ id }, userPolicy.scope(actor)] }, include: withCustomer });

  router.get(
    '/',
    requireUser,
    validate(listQuerySchema, 'query'),
    authorize(userPolicy.list),
    handle(async (req, res) => {
      const q = res.locals.query as ListQuery;
      const where = {
        ...userPolicy.scope(req.user!),
        ...(q.q
          ? {
              [Op.or]: [
                { name: { [Op.iLike]: `%${q.q}%` } },
                { email: { [Op.iLike]: `%${q.q}%` } },
              ],
            }
          : {}),
      };
      const { rows, count } = await User.findAndCountAll({
        where,
        include: withCustomer,
        order: orderFrom(q.sort, SORT, [['name', 'ASC']]),
        limit: q.pageSize,
        offset: (q.page - 1) * q.pageSize,
      });
      res.json(presentPage(rows.map(presentUser), count, q));
    }),
  );

  router.post(
    '/',
    requireUser,
    validate(createUserSchema),
    authorize(userPolicy.create),
    handle(async (req, res) => {
      const user = await createUser(req.user!, res.locals.body);
      const full = await findUser(user.id, req.user!);
      res.status(201).json(presentUser(full!));
    }),
  );

  router.patch(
    '/:id',
    requireUser,
    validate(updateUserSchema),
    load('User', findUser),
    authorize(userPolicy.update),
    handle(async (req, res) => {
      const user = await updateUser(
        req.user!,
        res.locals.record as User,
        res.locals.body,
        req.sessionID,
      );
      res.json(presentUser(user));
    }),
  );

  return router;
}
