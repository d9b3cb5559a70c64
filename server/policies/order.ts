import type { WhereOptions } from 'sequelize';
import type { Order, User } from '../models';
import { all, hasRole, ownCompany, type Predicate } from './predicates';

/** Lines may change only while the order is a draft (a quoted order needs a new revision). */
export const isDraft: Predicate<Order> = (_actor, order) => order.status === 'draft';

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
