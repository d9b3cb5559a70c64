import type { Order, OrderLine } from '../models';
import { all, hasRole, ownCompany } from './predicates';

/**
 * Truss design drawings of an order's lines (the record is the loaded, already scoped order):
 * the desk, the plant manager and the design reviewer print any line's; a builder of the order's
 * company receives a line's once it is approved or was in a quote sent to them — any other line
 * answers 404 to them, as if it did not exist.
 */
export const designDrawingPolicy = {
  show: all<Order>(hasRole('admin', 'sales', 'engineer', 'builder'), ownCompany),
  /** Whether this (already authorised) viewer may see this line's drawing. */
  visible: (role: string, line: Pick<OrderLine, 'reviewState' | 'mark'>, sentMarks: Set<string>) =>
    role !== 'builder' || line.reviewState === 'approved' || sentMarks.has(line.mark),
};
