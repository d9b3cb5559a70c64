import type { Order } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/**
 * Quote revisions of an order (the record is the loaded, already scoped order): the desk and the
 * plant manager make and send them; a builder reads their own company's.
 */
export const quotePolicy = {
  list: all<Order>(hasRole('admin', 'sales', 'builder'), ownCompany),
  show: all<Order>(hasRole('admin', 'sales', 'builder'), ownCompany),
  create: all<Order>(hasRole('admin', 'sales'), ownCompany),
  send: all<Order>(hasRole('admin', 'sales'), ownCompany),
};
