import { AppError } from '../errors';
import type { Order } from '../models';

/**
 * A change names the order's version the user saw: a newer one answers 409 `stale` and nothing
 * changes (call it right after locking the order row).
 */
export function requireSeenVersion(order: Order, seen: number) {
  if (order.version === seen) return;
  throw new AppError(
    409,
    'stale',
    `Order ${order.number} changed since you opened it (now version ${order.version}). Reload it and try again.`,
    { version: `Current version is ${order.version}` },
  );
}
