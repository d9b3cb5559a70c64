import type { Order } from '../models';
import { all, hasRole, samePlant } from './predicates';

/**
 * Shop paper (plate schedule, tags, delivery ticket, shop drawings): the shop foreman, the sales
 * desk and the plant manager of the order's plant; never a builder, never another plant (the
 * order loads within the plant's scope first, so that answers 404).
 */
export const shopPaperPolicy = {
  show: all<Order>(hasRole('admin', 'sales', 'foreman'), samePlant),
};
