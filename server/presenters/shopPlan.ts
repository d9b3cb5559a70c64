import type { ShopOrder } from '../../shared/api/shop';
import type { CutListStatus, ShopPlanStatus, StoredPlanState } from '../../shared/api/shopPlan';
import { ENGINE_VERSION } from '../../shared/engine/version';
import type { Order, ShopPlan } from '../models';

/** The order's inputs now, as hashes (`services/shopPlan/inputs.ts`). */
export interface PlanInputs {
  designsHash: string;
  stockHash: string;
}

/**
 * A stored plan's age, what changed since it was made (designs, stock settings, engine) against
 * the order's hashes now, and the run making the next. `made` is the row once a plan is stored.
 */
function storedPlanState(row: ShopPlan | null, now: PlanInputs): StoredPlanState {
  const made = row?.madeAt ? row : null;
  const outOfDate: StoredPlanState['outOfDate'] = [];
  if (made) {
    if (made.designsHash !== now.designsHash) outOfDate.push('designs');
    if (made.stockHash !== now.stockHash) outOfDate.push('stock');
    if (made.engineVersion !== ENGINE_VERSION) outOfDate.push('engine');
  }
  return {
    madeAt: made?.madeAt?.toISOString() ?? null,
    engineVersion: made?.engineVersion ?? null,
    outOfDate,
    run: {
      state: row?.runState ?? 'idle',
      progress: row?.runProgress ?? null,
      error: row?.runError ?? null,
      requestedAt: row?.requestedAt?.toISOString() ?? null,
    },
  };
}

/** An order's lumber-plan status: the stored plan, its age and currency, and its run. */
export function presentShopPlan(
  order: Pick<Order, 'id' | 'number'>,
  row: ShopPlan | null,
  now: PlanInputs,
): ShopPlanStatus {
  return {
    orderId: order.id,
    orderNumber: order.number,
    plan: (row?.madeAt && row.lumberPlan) || null,
    ...storedPlanState(row, now),
  };
}

/** An order's cut-list status: the order as the shop lists it, the stored cut list and its run. */
export function presentCutListStatus(
  order: ShopOrder,
  row: ShopPlan | null,
  now: PlanInputs,
): CutListStatus {
  return { order, cutList: (row?.madeAt && row.cutList) || null, ...storedPlanState(row, now) };
}
