import type { Order } from '../models';
import { all, hasRole, samePlant } from './predicates';

/**
 * Shop paper (cut lists): the foreman, and the desk and plant manager who answer for the order;
 * never a builder. The order is already scoped to the actor's plant by its load step.
 */
export const shopPolicy = {
  list: hasRole('foreman', 'sales', 'admin'),
  cutList: all<Order>(hasRole('foreman', 'sales', 'admin'), samePlant),
  /** Whoever reads the cut list may ask for a new plan. */
  replan: all<Order>(hasRole('foreman', 'sales', 'admin'), samePlant),
};
