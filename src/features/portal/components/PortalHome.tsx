import { orderStatusLabel } from '../../../../shared/api/orderStatus';
import { formatDate, formatDateTime } from '../../../lib/format';
import { Link } from 'react-router';
import { validUntilText } from '../../../../shared/api/terms';
import { Badge, Card, EmptyState, PageHeader, QueryState } from '../../../components/ui';
import { usePortalHome } from '../api/get-home';
import { PortalJobs } from './PortalJobs';

const money = (v: number, c: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency: c }).format(v);

/** The builder's home: what needs them now, first. */
export function PortalHome() {
  const home = usePortalHome();
  return (
    <>
      <PageHeader title="What needs you" />
      <QueryState query={home} what="your portal">
        {(h) => (
          <div className="space-y-4">
            <Card title="Quotes waiting for your answer">
              {h.quotesWaiting.length === 0 ? (
                <EmptyState title="No quotes waiting" />
              ) : (
                <ul className="divide-y divide-sand-200">
                  {h.quotesWaiting.map((q) => (
                    <li key={q.reference} className="py-3">
                      <Link
                        className="block font-medium text-timber-700 underline"
                        to={`/portal/orders/${q.orderId}/quotes/${q.number}`}
                      >
                        {q.job} — {q.reference}
                      </Link>
                      <p className="text-sm text-sand-700">
                        {money(q.total, q.currency)} · {validUntilText(q.validUntil)} (
                        {q.daysLeft === 1 ? '1 day' : `${q.daysLeft} days`} left)
                      </p>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
            {h.depositsDue.length > 0 ? (
              <Card title="Deposits due">
                <ul className="divide-y divide-sand-200">
                  {h.depositsDue.map((d) => (
                    <li key={d.orderId} className="py-3">
                      <Link
                        className="font-medium text-timber-700 underline"
                        to={`/portal/orders/${d.orderId}`}
                      >
                        {d.job}: {money(d.amount, d.currency)}
                      </Link>
                      <p className="text-sm text-sand-700">Deposit on {d.reference}</p>
                    </li>
                  ))}
                </ul>
              </Card>
            ) : null}
            <Card title="Your orders in progress">
              {h.inProgress.length === 0 ? (
                <EmptyState title="No orders in progress" />
              ) : (
                <ul className="divide-y divide-sand-200">
                  {h.inProgress.map((o) => (
                    <li key={o.orderId} className="flex items-center justify-between gap-2 py-3">
                      <Link
                        className="text-timber-700 underline"
                        to={`/portal/orders/${o.orderId}`}
                      >
                        {o.job} · {o.orderNumber}
                      </Link>
                      <span className="text-right text-sm">
                        <Badge tone="info">{orderStatusLabel(o.status, 'builder')}</Badge>
                        <br />
                        {o.plannedDelivery
                          ? `Delivery ${formatDate(o.plannedDelivery)}`
                          : 'Delivery not scheduled yet'}
                      </span>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
            <PortalJobs />
            <Card title="Recent messages from the plant">
              {h.messages.length === 0 ? (
                <EmptyState title="No messages yet" />
              ) : (
                <ul className="space-y-2 text-sm">
                  {h.messages.map((m) => (
                    <li key={m.id}>
                      {m.subject}
                      <span className="block text-sand-600">{formatDateTime(m.at)}</span>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
          </div>
        )}
      </QueryState>
    </>
  );
}
