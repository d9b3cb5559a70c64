import {
  outOfDateText,
  type ShopPlanProgress,
  type StoredPlanState,
} from '../../../shared/api/shopPlan';
import { Alert, Button, ErrorMessage } from '../ui';

const when = (iso: string) =>
  new Date(iso).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' });

const gapText = (p: ShopPlanProgress) =>
  p.gapPercent === null
    ? ''
    : p.gapPercent <= 0.005
      ? ' · best plan at the lower bound'
      : ` · best plan at most ${p.gapPercent.toFixed(1)} % above the lower bound`;

/** What the solver is doing inside one lumber, in words. */
function solverText(p: ShopPlanProgress) {
  switch (p.solverStage) {
    case 'starting':
      return '…';
    case 'column-generation':
      return ` · column generation, round ${p.iterations}${gapText(p)}`;
    case 'integer-phase':
      return (
        ` · whole boards, step ${p.steps}` +
        (p.piecesLeft !== null && p.piecesLeft > 0
          ? ` (${p.piecesLeft} of ${p.pieces} pieces left)`
          : '') +
        gapText(p)
      );
    default:
      return ` · planned in ${p.iterations} rounds${gapText(p)}`;
  }
}

/** Share of one lumber done: column generation a quarter, the integer phase the rest. */
function withinLumber(p: ShopPlanProgress) {
  if (p.solverStage === 'done') return 1;
  if (p.solverStage !== 'integer-phase') return p.solverStage === 'starting' ? 0 : 0.15;
  const left = p.pieces > 0 && p.piecesLeft !== null ? p.piecesLeft / p.pieces : 1;
  return 0.25 + 0.7 * (1 - left);
}

/** What the running plan is doing, in words, with a bar over the lumbers. */
function Progress({ run }: { run: StoredPlanState['run'] }) {
  const p = run.progress;
  const text =
    run.state === 'queued' || !p
      ? 'Waiting for the job queue…'
      : p.stage === 'cutting'
        ? 'Cutting every piece of every truss…'
        : p.stage === 'storing'
          ? 'Storing the plan…'
          : `Planning ${p.lumber} (${p.section} of ${p.sections})${solverText(p)}`;
  const share =
    p?.stage === 'storing'
      ? 1
      : p && p.sections > 0
        ? (p.section - 1 + withinLumber(p)) / p.sections
        : 0;
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

/** Props of {@link StoredPlanBar}: the plan's state and the feature's Re-plan request. */
export interface StoredPlanBarProps {
  state: StoredPlanState;
  /** Whether a stored plan exists (the page shows it below). */
  hasPlan: boolean;
  onReplan: () => void;
  replanPending: boolean;
  replanError: unknown;
}

/**
 * Above every stored shop paper (cut list, lumber plan): when it was made and by which engine,
 * "Out of date" with what changed, the run making the next (with its progress), and Make the
 * plan / Re-plan. On paper only the out-of-date warning remains.
 */
export function StoredPlanBar({
  state,
  hasPlan,
  onReplan,
  replanPending,
  replanError,
}: StoredPlanBarProps) {
  const busy = state.run.state === 'queued' || state.run.state === 'running';
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-3 print:hidden" data-print-hide>
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-sm text-sand-700">
            {state.madeAt
              ? `Plan made ${when(state.madeAt)} by engine ${state.engineVersion ?? '?'}.`
              : busy
                ? 'The first plan of this order is being made.'
                : 'No plan has been made for this order yet.'}
          </p>
          <Button
            variant={state.outOfDate.length > 0 || !hasPlan ? 'primary' : 'secondary'}
            onClick={onReplan}
            busy={replanPending}
            disabled={busy}
          >
            {hasPlan ? 'Re-plan' : 'Make the plan'}
          </Button>
        </div>
        {replanError ? <ErrorMessage error={replanError} /> : null}
        {busy ? <Progress run={state.run} /> : null}
        {state.run.state === 'failed' ? (
          <Alert tone="danger" title="The last plan could not be made">
            {state.run.error}
          </Alert>
        ) : null}
      </div>
      {/* Printed too: paper that is out of date says so. */}
      {state.outOfDate.length > 0 ? (
        <Alert tone="warning" title="Out of date">
          {outOfDateText(state.outOfDate)}
        </Alert>
      ) : null}
    </div>
  );
}
