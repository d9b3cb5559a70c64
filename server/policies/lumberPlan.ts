import type { Order } from '../models';
import { all, hasRole, samePlant, type Predicate } from './predicates';

/**
 * Shop paper of an order: the foreman, the desk and the plant manager of the order's plant. The
 * order is loaded within the actor's scope first (another plant's or company's answers 404), so a
 * builder reaching their own order gets 403 here.
 */
export const lumberPlanPolicy = {
  show: all<Order>(hasRole('admin', 'sales', 'foreman'), samePlant as Predicate<Order>),
  /** Whoever reads the plan may ask for a new one. */
  replan: all<Order>(hasRole('admin', 'sales', 'foreman'), samePlant as Predicate<Order>),
};
