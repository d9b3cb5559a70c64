import type { ShopPlanStatus } from '../../shared/api/shopPlan';
import { ENGINE_VERSION } from '../../shared/engine/version';
import type { Order, ShopPlan } from '../models';

/**
 * An order's lumber-plan status: the stored plan and when it was made, what changed since
 * (designs, stock settings, engine) against the order's hashes now, and the run making the next.
 */
export function presentShopPlan(
  order: Pick<Order, 'id' | 'number'>,
  row: ShopPlan | null,
  now: { designsHash: string; stockHash: string },
): ShopPlanStatus {
  const made = row?.lumberPlan ? row : null;
  const outOfDate: ShopPlanStatus['outOfDate'] = [];
  if (made) {
    if (made.designsHash !== now.designsHash) outOfDate.push('designs');
    if (made.stockHash !== now.stockHash) outOfDate.push('stock');
    if (made.engineVersion !== ENGINE_VERSION) outOfDate.push('engine');
  }
  return {
    orderId: order.id,
    orderNumber: order.number,
    plan: made?.lumberPlan ?? null,
    madeAt: made?.madeAt?.toISOString() ?? null,
    outOfDate,
    run: {
      state: row?.runState ?? 'idle',
      progress: row?.runProgress ?? null,
      error: row?.runError ?? null,
      requestedAt: row?.requestedAt?.toISOString() ?? null,
    },
  };
}
