import type { WhereOptions } from 'sequelize';
import type { User } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/** Jobs: every staff role reads its plant's; a builder reads their company's; the desk edits. */
export const jobPolicy = {
  list: hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'),
  show: all(hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'), ownCompany),
  update: all(hasRole('admin', 'sales'), ownCompany),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, customerId: actor.customerId! }
      : { plantId: actor.plantId },
};
