import type { OrderDetail } from '../../../../shared/api/orders';
import type { PaymentSummary } from '../../../../shared/api/portal';
import { Badge, Card, type BadgeTone } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { formatAmount } from '../money';
import { MailStatus } from './MailStatus';
import { OfflinePaymentForm } from './OfflinePaymentForm';

const KIND: Record<PaymentSummary['kind'], string> = {
  deposit: 'Card deposit',
  offline: 'Offline payment',
  refund: 'Refund',
};
const METHOD: Record<PaymentSummary['method'], string> = {
  card: 'card',
  cheque: 'cheque',
  transfer: 'bank transfer',
  cash: 'cash',
};
const STATE: Record<PaymentSummary['status'], { label: string; tone: BadgeTone }> = {
  pending: { label: 'Checkout open', tone: 'info' },
  succeeded: { label: 'Received', tone: 'success' },
  failed: { label: 'Failed', tone: 'danger' },
};
/** Orders that take money: accepted and not cancelled (the server says the same). */
const TAKES_PAYMENT = new Set(['draft', 'quoted', 'cancelled']);

function Figures({ money }: { money: NonNullable<OrderDetail['money']> }) {
  const m = (v: number) => formatAmount(v, money.currency);
  const rows: [string, string, string?][] = [
    ['Accepted total', m(money.total)],
    ['Deposit asked', m(money.deposit)],
    ['Deposit still due', m(money.depositDue), money.depositDue > 0 ? 'warning' : undefined],
    ['Paid', m(money.paid + money.refunded)],
    ['Refunded', money.refunded > 0 ? `−${m(money.refunded)}` : m(0)],
    ['Outstanding', m(money.balance), 'strong'],
  ];
  return (
    <dl
      className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-6"
      data-testid="order-money"
    >
      {rows.map(([label, value, mark]) => (
        <div key={label}>
          <dt className="text-xs text-sand-600">{label}</dt>
          <dd
            className={
              mark === 'strong'
                ? 'text-lg font-semibold tabular-nums text-sand-900'
                : mark === 'warning'
                  ? 'text-lg tabular-nums text-warning-800'
                  : 'text-lg tabular-nums text-sand-900'
            }
          >
            {value}
          </dd>
        </div>
      ))}
    </dl>
  );
}

function PaymentRows({ orderId, payments }: { orderId: number; payments: PaymentSummary[] }) {
  if (payments.length === 0)
    return <p className="text-sm text-sand-600">No payments on this order yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="order-payments">
        <thead className="border-b border-sand-200 text-xs text-sand-600">
          <tr>
            <th className="py-2 pr-4 font-medium">Date</th>
            <th className="py-2 pr-4 font-medium">Payment</th>
            <th className="py-2 pr-4 font-medium">Reference</th>
            <th className="py-2 pr-4 font-medium">State</th>
            <th className="py-2 pr-4 text-right font-medium">Amount</th>
            <th className="py-2 font-medium">Receipt</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-sand-100">
          {payments.map((p) => (
            <tr key={p.id}>
              <td className="py-2 pr-4 whitespace-nowrap">{formatDate(p.paidAt)}</td>
              <td className="py-2 pr-4">
                {KIND[p.kind]} · {METHOD[p.method]}
              </td>
              <td className="py-2 pr-4">{p.reference ?? '—'}</td>
              <td className="py-2 pr-4">
                <Badge tone={STATE[p.status].tone}>{STATE[p.status].label}</Badge>
              </td>
              <td className="py-2 pr-4 text-right tabular-nums whitespace-nowrap">
                {p.kind === 'refund' ? '−' : ''}
                {formatAmount(p.amount, p.currency)}
              </td>
              <td className="py-2">
                {p.status === 'succeeded' && p.receiptNumber ? (
                  <a
                    className="text-timber-700 underline underline-offset-2"
                    href={`/api/orders/${orderId}/payments/${p.id}/receipt`}
                    target="_blank"
                    rel="noreferrer"
                  >
                    {p.receiptNumber}
                  </a>
                ) : (
                  '—'
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * The desk's side of an order's money (sales, plant manager): deposit and balance, every payment
 * with its state and receipt, "Record offline payment", and the delivery state of the order's mail.
 */
export function DeskPayments({ order }: { order: OrderDetail }) {
  const money = order.money;
  return (
    <>
      <Card title="Payments and balance">
        {money ? (
          <div className="flex flex-col gap-6">
            <Figures money={money} />
            <PaymentRows orderId={order.id} payments={order.payments} />
            {TAKES_PAYMENT.has(order.status) ? null : (
              <div className="border-t border-sand-200 pt-4">
                <OfflinePaymentForm
                  orderId={order.id}
                  currency={money.currency}
                  version={order.version}
                  suggested={money.depositDue > 0 ? money.depositDue : Math.max(0, money.balance)}
                />
              </div>
            )}
          </div>
        ) : (
          <p className="text-sm text-sand-600">
            {order.status === 'cancelled'
              ? 'This order was cancelled before a quote was accepted: no money is due.'
              : 'Nothing is due yet: payments are taken once the builder accepts a quote.'}
          </p>
        )}
      </Card>
      <MailStatus orderId={order.id} />
    </>
  );
}
