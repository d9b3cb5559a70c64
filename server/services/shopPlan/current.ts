/**
 * What an order's stored shop plan is compared with: the hashes of its approved designs and the
 * plant's stock settings now, and the stored row (null before the first request).
 */
import type { StoredPlanState } from '../../../shared/api/shopPlan';
import { stockFor } from '../../commands/stockSettings';
import { conflict } from '../../errors';
import { ShopPlan, type Order, type OrderLine } from '../../models';
import { designsHash, stockHash } from './inputs';

export async function storedPlanOf(
  order: Pick<Order, 'id' | 'plantId'>,
  lines: readonly OrderLine[],
) {
  const [row, stock] = await Promise.all([
    ShopPlan.findOne({ where: { orderId: order.id } }),
    stockFor(order.plantId),
  ]);
  return { row, now: { designsHash: designsHash(lines), stockHash: stockHash(stock) } };
}

/** Why there is no stored plan to export yet (409): failed, still being made, or never asked for. */
export function noStoredPlan(what: string, run: StoredPlanState['run']) {
  if (run.state === 'failed') {
    return conflict(`The ${what} could not be made: ${run.error ?? 'unknown error'}`);
  }
  if (run.state === 'queued' || run.state === 'running') {
    return conflict(`The ${what} is still being made; try again in a moment.`);
  }
  return conflict(`No ${what} has been made for this order yet: choose Make the plan on its page.`);
}
