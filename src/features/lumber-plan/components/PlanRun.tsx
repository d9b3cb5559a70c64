import type { ShopPlanStatus } from '../../../../shared/api/shopPlan';
import { StoredPlanBar } from '../../../components/shop-plan/StoredPlanBar';
import { useReplan } from '../api/replan';

/** The stored plan's age and currency, the run making the next (with progress) and Re-plan. */
export function PlanRun({ status }: { status: ShopPlanStatus }) {
  const replan = useReplan(status.orderId);
  return (
    <StoredPlanBar
      state={status}
      hasPlan={status.plan !== null}
      onReplan={() => replan.mutate()}
      replanPending={replan.isPending}
      replanError={replan.error}
    />
  );
}
