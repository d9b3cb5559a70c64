import type { LumberPlanBody, LumberPlanSection } from '../../../../shared/api/lumberPlan';
import { Alert, Button, Card, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { lumberPlanFiles, useLumberPlan } from '../api/get-lumber-plan';
import { BoardBar } from './BoardBar';
import { PlanRun } from './PlanRun';
import './print.css';

const money = (v: number) =>
  `$${v.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

/** "the least possible cost" when proven, else how far above it the plan may be. */
function boundText(p: NonNullable<LumberPlanSection['plan']>) {
  return p.optimal || p.gapPercent === 0
    ? 'the least possible cost (proven by its lower bound)'
    : `at most ${p.gapPercent.toFixed(2)} % above the least possible cost`;
}

function Section({ s }: { s: LumberPlanSection }) {
  const p = s.plan;
  return (
    <section aria-labelledby={`lumber-${s.lumber}`}>
      <Card flush>
        <div className="flex flex-wrap items-baseline justify-between gap-2 px-4 pt-4">
          <h2 id={`lumber-${s.lumber}`} className="text-lg font-semibold text-sand-900">
            {s.lumber}
          </h2>
          <span className="text-sm text-sand-600">
            {s.pieceCount} pieces{s.stockFrom ? ` · cut from ${s.stockFrom} stock` : ''}
          </span>
        </div>
        {!p ? (
          <div className="p-4">
            <Alert tone="danger" title="No plan for this lumber">
              {s.error?.message}
            </Alert>
          </div>
        ) : (
          <div className="flex flex-col gap-3 p-4">
            <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-5">
              <div>
                <dt className="text-sand-600">Boards</dt>
                <dd className="font-semibold tabular-nums">{p.boardCount}</dd>
              </div>
              <div>
                <dt className="text-sand-600">Board feet</dt>
                <dd className="font-semibold tabular-nums">{p.boardFeet.toFixed(1)}</dd>
              </div>
              <div>
                <dt className="text-sand-600">Cost</dt>
                <dd className="font-semibold tabular-nums">{money(p.totalCost)}</dd>
              </div>
              <div>
                <dt className="text-sand-600">Waste</dt>
                <dd className="font-semibold tabular-nums">{p.wastePercent.toFixed(1)} %</dd>
              </div>
              <div>
                <dt className="text-sand-600">Lower bound</dt>
                <dd className="font-semibold tabular-nums">{money(p.lowerBound)}</dd>
              </div>
            </dl>
            <p className="text-sm text-sand-800">
              This plan costs <strong>{boundText(p)}</strong>.{' '}
              {p.firstFitDecreasing
                ? `First-fit decreasing would have used ${p.firstFitDecreasing.boardCount} boards for ${money(p.firstFitDecreasing.totalCost)} (waste ${p.firstFitDecreasing.wastePercent.toFixed(1)} %): ${money(p.firstFitDecreasing.totalCost - p.totalCost)} saved.`
                : 'First-fit decreasing could not fit this order into the stock on hand.'}
            </p>
            <p className="text-sm text-sand-800">
              Pull from the rack: {p.byStock.map((b) => `${b.count} × ${b.lengthFt} ft`).join(', ')}
            </p>
            <div>
              {p.boards.map((b, i) => (
                <BoardBar
                  key={i}
                  board={b}
                  longestFt={Math.max(...p.boards.map((x) => x.lengthFt))}
                />
              ))}
            </div>
          </div>
        )}
      </Card>
    </section>
  );
}

/** The stored plan: per lumber, boards to pull and what to cut from each. */
function Plan({ plan: p, orderId }: { plan: LumberPlanBody; orderId: number }) {
  const files = lumberPlanFiles(orderId);
  return (
    <>
      <div className="flex flex-wrap items-center gap-2" data-print-hide>
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
        <a
          className="rounded px-3 py-2 text-sm font-medium text-timber-800 underline"
          href={files.pdf}
        >
          PDF
        </a>
        <a
          className="rounded px-3 py-2 text-sm font-medium text-timber-800 underline"
          href={files.csv}
        >
          CSV
        </a>
      </div>
      <p className="text-sm text-sand-700">
        Kerf {p.kerfIn} in between pieces, end trim {p.trimIn} in per board. {p.totals.boardCount}{' '}
        boards, {money(p.totals.totalCost)}; lower bound {money(p.totals.lowerBound)}.
      </p>
      {p.demoStock ? (
        <Alert tone="warning" title="Demo stock">
          Planned from invented demo stock lengths and prices; the plant manager enters the plant’s
          own under Lumber stock.
        </Alert>
      ) : null}
      {p.sections.map((s) => (
        <Section key={s.lumber} s={s} />
      ))}
      <ul className="list-disc pl-5 text-xs text-sand-600">
        {p.cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </>
  );
}

/** `/shop/orders/:id/lumber-plan`: the stored plan, its age and run, and Re-plan. */
export function LumberPlanPage({ orderId }: { orderId: number }) {
  const status = useLumberPlan(orderId);
  return (
    <div data-print-sheet>
      <p className="mb-2 text-sm print:hidden" data-print-hide>
        <TextLink to={`/shop/orders/${orderId}`}>← Cut list</TextLink>
      </p>
      <QueryState query={status} what="the lumber plan">
        {(s) => (
          <div className="flex flex-col gap-4">
            <PageHeader title={`Lumber plan — order ${s.orderNumber}`} />
            <PlanRun status={s} />
            {s.plan ? <Plan plan={s.plan} orderId={orderId} /> : null}
          </div>
        )}
      </QueryState>
    </div>
  );
}
