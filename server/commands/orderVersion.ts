import { AppError } from '../errors';
import type { Transaction } from 'sequelize';
import type { Order } from '../models';

/**
 * A change names the order's version the user saw: a newer one answers 409 `stale` and nothing
 * changes (call it right after locking the order row).
 */
export function requireSeenVersion(order: Order, seen: number, what = 'Reload it and try again.') {
  if (order.version === seen) return;
  throw new AppError(
    409,
    'stale',
    `Order ${order.number} changed since you opened it (now version ${order.version}). ${what}`,
    { version: `Current version is ${order.version}` },
  );
}

/**
 * Money arrived or left (a payment recorded, a card deposit or a refund settled): the order's own
 * columns may not change, so raise its version by hand — a form opened before (another payment, a
 * production change) then answers 409 `stale`. Call it with the order row locked.
 */
export async function bumpOrderVersion(t: Transaction, order: Order) {
  await order.increment('version', { transaction: t });
  await order.reload({ transaction: t });
}
