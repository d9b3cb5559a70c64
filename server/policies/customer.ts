import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/** Builder companies: the sales desk and the plant manager work with them. */
export const customerPolicy = {
  list: hasRole('admin', 'sales'),
  show: all(hasRole('admin', 'sales', 'builder'), (actor, c: { id: number; plantId: number }) =>
    ownCompany(actor, { plantId: c.plantId, customerId: c.id }),
  ),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, id: actor.customerId! }
      : { plantId: actor.plantId },
};
