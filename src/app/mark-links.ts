import type { LineSummary } from '../../shared/api/orders';
import type { Role } from '../../shared/api/roles';
import { reviewPath } from '../features/reviews/review-link';
import { canManageSales } from '../lib/permissions';

/**
 * Where a line's mark on the order page leads for this role: the desk opens its design, the
 * reviewer its review; builders and the shop get plain marks.
 */
export function markLinkFor(
  role: Role,
): ((orderId: number, line: LineSummary) => string) | undefined {
  if (canManageSales(role)) return (orderId, line) => `/orders/${orderId}/lines/${line.id}`;
  if (role === 'engineer') return (orderId, line) => reviewPath(line.id, orderId);
  return undefined;
}
