import type { WhereOptions } from 'sequelize';
import type { Order, User } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/** Orders: the desk writes, every staff role reads, a builder reads their company's. */
export const orderPolicy = {
  list: hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'),
  show: all(hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'), ownCompany),
  create: hasRole('admin', 'sales'),
  editLines: all<Order>(hasRole('admin', 'sales'), ownCompany),
  review: all<Order>(hasRole('engineer'), ownCompany),
  reviewQueue: hasRole('engineer', 'admin'),
  preview: hasRole('admin', 'sales', 'engineer', 'foreman'),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, customerId: actor.customerId! }
      : { plantId: actor.plantId },
};
