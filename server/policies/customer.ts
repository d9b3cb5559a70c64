import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { all, hasRole, ownCompany } from './predicates';

const ownRecord = (actor: User, c: { id: number; plantId: number }) =>
  ownCompany(actor, { plantId: c.plantId, customerId: c.id });

/** Builder companies: the sales desk and the plant manager work with them; a builder sees their own. */
export const customerPolicy = {
  list: hasRole('admin', 'sales'),
  create: hasRole('admin', 'sales'),
  show: all(hasRole('admin', 'sales', 'builder'), ownRecord),
  update: all(hasRole('admin', 'sales'), ownRecord),
  addJob: all(hasRole('admin', 'sales'), ownRecord),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, id: actor.customerId! }
      : { plantId: actor.plantId },
};
