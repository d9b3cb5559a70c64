import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { hasRole, ownCompany, all } from './predicates';

/** Jobs: every staff role reads its plant's; a builder reads their company's. */
export const jobPolicy = {
  list: hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'),
  show: all(hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'), ownCompany),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, customerId: actor.customerId! }
      : { plantId: actor.plantId },
};
