import { formatDateTime } from '../../../lib/format';
import { Link } from 'react-router';
import type { CutListGroupView, CutListView } from '../../../../shared/api/shop';
import type { CutListStatus } from '../../../../shared/api/shopPlan';
import { StoredPlanBar } from '../../../components/shop-plan/StoredPlanBar';
import { Alert, Button, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { cutListUrl, useCutList } from '../api/get-cut-list';
import { useReplanCutList } from '../api/replan';

const linkClass =
  'inline-flex h-11 items-center justify-center rounded border border-sand-300 bg-white px-4 font-medium text-sand-900 hover:bg-sand-100';

function GroupTable({ group }: { group: CutListGroupView }) {
  return (
    <section className="mb-6 rounded-md border border-sand-200 bg-white print:mb-4 print:border-sand-400">
      <header className="flex items-baseline justify-between gap-4 border-b border-sand-200 bg-sand-50 px-4 py-3">
        <h2 className="text-lg font-semibold text-sand-900">{group.label}</h2>
        <p className="text-sm text-sand-600">
          {group.quantity} pieces · {group.totalLength}
        </p>
      </header>
      <table className="w-full text-left align-top text-base print:text-sm">
        <caption className="sr-only">{group.label} pieces, longest first</caption>
        <thead className="border-b border-sand-200 text-sm text-sand-600">
          <tr>
            <th className="px-3 py-2 font-medium">Mark</th>
            <th className="px-3 py-2 text-right font-medium">Qty</th>
            <th className="px-3 py-2 text-right font-medium">Length</th>
            <th className="px-3 py-2 font-medium">First end</th>
            <th className="px-3 py-2 font-medium">Second end</th>
            <th className="px-3 py-2 font-medium">Notes</th>
          </tr>
        </thead>
        <tbody>
          {group.rows.map((r) => (
            <tr
              key={r.mark}
              className="break-inside-avoid border-b border-sand-100 align-top last:border-0"
            >
              <td className="px-3 py-2 font-semibold whitespace-nowrap">{r.mark}</td>
              <td className="px-3 py-2 text-right font-semibold tabular-nums">{r.quantity}</td>
              <td className="px-3 py-2 text-right font-semibold whitespace-nowrap tabular-nums">
                {r.length.text}
              </td>
              <td className="px-3 py-2">{r.ends[0].text}</td>
              <td className="px-3 py-2">{r.ends[1].text}</td>
              <td className="px-3 py-2 text-sm text-sand-600">
                {r.perTruss} per truss × {r.trusses} × {r.plies} {r.plies === 1 ? 'ply' : 'plies'}.{' '}
                {r.notes.join(' ')}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

function CutList({ view }: { view: CutListView }) {
  return (
    <>
      <p className="mb-4 text-sm text-sand-600">
        <span className="font-semibold text-sand-900">{view.quantity} pieces</span> to cut. Sorted{' '}
        {view.sortedBy.charAt(0).toLowerCase() + view.sortedBy.slice(1)} Angles are to the board’s
        edges (90° is square); lengths are long point to long point.
      </p>
      {view.groups.map((g) => (
        <GroupTable key={g.lumber} group={g} />
      ))}
      <Alert tone="warning" title="Cautions" className="break-inside-avoid">
        {view.cautions.join(' ')}
      </Alert>
      <p className="mt-3 text-xs text-sand-500">
        Made {formatDateTime(view.computedAt)} by engine {view.engineVersion} from designs of engine{' '}
        {view.designEngineVersions.join(', ')}.
      </p>
    </>
  );
}

/** The stored plan's state and Make the plan / Re-plan, then the stored cut list (if any). */
function StoredCutList({ status }: { status: CutListStatus }) {
  const replan = useReplanCutList(status.order.id);
  return (
    <div className="flex flex-col gap-4">
      <StoredPlanBar
        state={status}
        hasPlan={status.cutList !== null}
        onReplan={() => replan.mutate()}
        replanPending={replan.isPending}
        replanError={replan.error}
      />
      {status.cutList ? <CutList view={status.cutList} /> : null}
    </div>
  );
}

/**
 * One order's stored cut list for the saw (made by the shop-plan job, never computed on request):
 * tablet sized, prints without the app's navigation.
 */
export function CutListPage({ orderId }: { orderId: number }) {
  const query = useCutList(orderId);
  const order = query.data?.order;
  const stored = query.data?.cutList != null;
  return (
    <>
      <p className="mb-2 text-sm print:hidden">
        <TextLink to="/shop">← Ready for the shop</TextLink>
      </p>
      <PageHeader
        title={order ? `Cut list · Order ${order.number}` : 'Cut list'}
        description={order ? `${order.job.name} · ${order.customer.name}` : undefined}
        actions={
          <div className="flex items-center gap-2 print:hidden">
            <Link className={linkClass} to={`/shop/orders/${orderId}/lumber-plan`}>
              Lumber plan
            </Link>
            {stored ? (
              <>
                <a className={linkClass} href={cutListUrl(orderId, 'csv')} download>
                  CSV
                </a>
                <a
                  className={linkClass}
                  href={cutListUrl(orderId, 'pdf')}
                  target="_blank"
                  rel="noreferrer"
                >
                  PDF
                </a>
                <Button onClick={() => window.print()}>Print</Button>
              </>
            ) : null}
          </div>
        }
      />
      <QueryState query={query} what="the cut list">
        {(status) => <StoredCutList status={status} />}
      </QueryState>
    </>
  );
}
