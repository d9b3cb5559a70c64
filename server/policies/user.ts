import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { all, hasRole, samePlant } from './predicates';

/** Only the plant manager manages users, and only those of their own plant. */
export const userPolicy = {
  list: hasRole('admin'),
  create: hasRole('admin'),
  update: all(hasRole('admin'), samePlant),
  /** Which users the actor can see at all (others answer 404). */
  scope: (actor: User): WhereOptions => ({ plantId: actor.plantId }),
};
