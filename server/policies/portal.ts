import type { Order } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/**
 * The builder's portal actions on a loaded (scoped) order: a builder acts for their own company;
 * the desk records an acceptance on a builder's behalf, opens a deposit checkout for them and
 * records offline payments; only the plant manager cancels and refunds.
 */
export const portalPolicy = {
  accept: all<Order>(hasRole('builder', 'sales', 'admin'), ownCompany),
  requestChanges: all<Order>(hasRole('builder'), ownCompany),
  deposit: all<Order>(hasRole('builder', 'sales'), ownCompany),
  recordPayment: all<Order>(hasRole('sales', 'admin'), ownCompany),
  cancel: all<Order>(hasRole('admin'), ownCompany),
  mail: all<Order>(hasRole('sales', 'admin'), ownCompany),
  receipt: all<Order>(hasRole('builder', 'sales', 'admin'), ownCompany),
  home: hasRole('builder'),
};
