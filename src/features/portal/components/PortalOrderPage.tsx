import { formatDate, formatDateTime } from '../../../lib/format';
import type { ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { OrderDetail } from '../../../../shared/api/orders';
import { Alert, Card, PageHeader, QueryState } from '../../../components/ui';
import { usePortalOrder } from '../api/get-order';
import { timelineOf } from '../timeline';

/**
 * The builder's order: a timeline of its states with dates, the quote, the money (a slot the app
 * fills with the payments feature) and the history written for them.
 */
export function PortalOrderPage({
  id,
  payments,
}: {
  id: number;
  payments: (order: OrderDetail) => ReactNode;
}) {
  const [search] = useSearchParams();
  const back = search.get('deposit');
  const query = usePortalOrder(id, back === 'done');
  return (
    <QueryState query={query} what="the order">
      {(order) => (
        <>
          <PageHeader title={`${order.job.name} · ${order.number}`} />
          <div className="space-y-4">
            {back === 'done' ? (
              order.status === 'accepted' ? (
                <Alert tone="info">
                  Payment sent — waiting for the payment service to confirm…
                </Alert>
              ) : (
                <Alert tone="success" title="Deposit received">
                  Thank you. Your receipt is below and on its way by e-mail.
                </Alert>
              )
            ) : back === 'cancelled' ? (
              <Alert tone="warning">The payment was not completed; nothing was charged.</Alert>
            ) : null}
            {order.status === 'cancelled' ? (
              <Alert tone="danger">This order is cancelled.</Alert>
            ) : null}
            <Card title="Progress">
              <ol className="space-y-2">
                {timelineOf(order).map((s) => (
                  <li key={s.status} className="flex items-center gap-3 text-sm">
                    <span
                      aria-hidden
                      className={`h-3 w-3 rounded-full ${s.done ? 'bg-timber-600' : 'border border-sand-400'}`}
                    />
                    <span className={s.done ? 'font-medium' : 'text-sand-600'}>{s.label}</span>
                    <span className="ml-auto text-sand-600">{s.at ? formatDate(s.at) : ''}</span>
                  </li>
                ))}
              </ol>
            </Card>
            {order.acceptance ? (
              <p className="text-sm">
                Quote{' '}
                <Link
                  className="text-timber-700 underline"
                  to={`/portal/orders/${order.id}/quotes/${order.acceptance.quoteNumber}`}
                >
                  {order.acceptance.reference}
                </Link>{' '}
                accepted by {order.acceptance.name}.
              </p>
            ) : null}
            {payments(order)}
            <Card title="History">
              <ul className="space-y-2 text-sm">
                {order.history.map((h) => (
                  <li key={h.id}>
                    {h.summary}
                    <span className="block text-sand-600">{formatDateTime(h.at)}</span>
                  </li>
                ))}
              </ul>
            </Card>
          </div>
        </>
      )}
    </QueryState>
  );
}
