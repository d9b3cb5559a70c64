import type { ShopPlanStatus } from '../../../../shared/api/shopPlan';
import { Alert, Button, ErrorMessage } from '../../../components/ui';
import { useReplan } from '../api/replan';

const REASONS: Record<ShopPlanStatus['outOfDate'][number], string> = {
  designs: 'the order’s designs changed',
  stock: 'the stock settings changed',
  engine: 'the engine was updated',
};

const when = (iso: string) =>
  new Date(iso).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' });

/** What the running plan is doing, in words, with a bar over the lumbers. */
function Progress({ run }: { run: ShopPlanStatus['run'] }) {
  const p = run.progress;
  const text =
    run.state === 'queued' || !p
      ? 'Waiting for the job queue…'
      : p.stage === 'cutting'
        ? 'Cutting every piece of every truss…'
        : p.stage === 'storing'
          ? 'Storing the plan…'
          : `Planning ${p.lumber} (${p.section} of ${p.sections})` +
            (p.solverStage === 'starting'
              ? '…'
              : ` · ${p.iterations} column-generation rounds, ${p.solverStage === 'done' ? 'planned' : p.solverStage}`) +
            ` · ${p.totalIterations} rounds so far`;
  const share =
    p && p.sections > 0 ? (p.section - (p.solverStage === 'done' ? 0 : 1)) / p.sections : 0;
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-2">
      <p className="text-sm font-medium text-sand-900">{text}</p>
      <div className="h-2 w-full overflow-hidden rounded bg-sand-200" aria-hidden>
        <div
          className="h-full bg-timber-600 transition-all"
          style={{ width: `${Math.round(share * 100)}%` }}
        />
      </div>
    </div>
  );
}

/**
 * The stored plan's age and whether it is still current, the run making the next one (with its
 * progress) and the Re-plan button.
 */
export function PlanRun({ status }: { status: ShopPlanStatus }) {
  const replan = useReplan(status.orderId);
  const busy = status.run.state === 'queued' || status.run.state === 'running';
  return (
    <div className="flex flex-col gap-3" data-print-hide>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-sand-700">
          {status.madeAt
            ? `Plan made ${when(status.madeAt)} (engine ${status.plan?.engineVersion ?? '?'}).`
            : 'No plan has been made for this order yet.'}
        </p>
        <Button
          variant={status.outOfDate.length > 0 || !status.plan ? 'primary' : 'secondary'}
          onClick={() => replan.mutate()}
          busy={replan.isPending}
          disabled={busy}
        >
          {status.plan ? 'Re-plan' : 'Make the plan'}
        </Button>
      </div>
      {replan.error ? <ErrorMessage error={replan.error} /> : null}
      {busy ? <Progress run={status.run} /> : null}
      {status.run.state === 'failed' ? (
        <Alert tone="danger" title="The last plan could not be made">
          {status.run.error}
        </Alert>
      ) : null}
      {status.outOfDate.length > 0 ? (
        <Alert tone="warning" title="Out of date">
          This plan was made before {status.outOfDate.map((r) => REASONS[r]).join(' and ')}. Re-plan
          before cutting.
        </Alert>
      ) : null}
    </div>
  );
}
