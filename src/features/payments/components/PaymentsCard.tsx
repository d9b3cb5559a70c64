import { formatDate } from '../../../lib/format';
import type { OrderDetail } from '../../../../shared/api/orders';
import { Button, Card, ErrorMessage } from '../../../components/ui';
import { useStartDeposit } from '../api/start-deposit';
import { formatAmount } from '../money';

const KIND = { deposit: 'Card deposit', offline: 'Payment', refund: 'Refund' } as const;

/**
 * The money of an order for its builder: deposit due with a pay button (to the payment service's
 * hosted page), every payment with its receipt, and the balance.
 */
export function PaymentsCard({ order }: { order: OrderDetail }) {
  const start = useStartDeposit(order.id);
  const money = order.money;
  if (!money) return null;
  const canPay = order.status === 'accepted' && money.depositDue > 0;
  return (
    <Card title="Payments">
      {canPay ? (
        <div className="mb-4 rounded bg-sand-100 p-3">
          <p className="text-sm text-sand-700">Deposit due now</p>
          <p className="text-2xl font-semibold" data-testid="deposit-due">
            {formatAmount(money.depositDue, money.currency)}
          </p>
          <Button
            className="mt-3 w-full"
            busy={start.isPending}
            onClick={() =>
              start.mutate(undefined, { onSuccess: (s) => window.location.assign(s.url) })
            }
          >
            Pay deposit
          </Button>
          {start.error ? <ErrorMessage error={start.error} className="mt-2" /> : null}
        </div>
      ) : null}
      <ul className="divide-y divide-sand-200">
        {order.payments
          .filter((p) => p.status === 'succeeded')
          .map((p) => (
            <li key={p.id} className="flex items-center justify-between gap-2 py-2 text-sm">
              <span>
                {KIND[p.kind]} · {p.paidAt ? formatDate(p.paidAt) : ''}
                <br />
                <a
                  className="text-timber-700 underline"
                  href={`/api/orders/${order.id}/payments/${p.id}/receipt`}
                  target="_blank"
                  rel="noreferrer"
                >
                  Receipt {p.receiptNumber}
                </a>
              </span>
              <span className="font-medium">
                {p.kind === 'refund' ? '−' : ''}
                {formatAmount(p.amount, p.currency)}
              </span>
            </li>
          ))}
      </ul>
      <dl className="mt-3 grid grid-cols-2 gap-1 text-sm">
        <dt className="text-sand-700">Quote total</dt>
        <dd className="text-right">{formatAmount(money.total, money.currency)}</dd>
        <dt className="text-sand-700">Paid</dt>
        <dd className="text-right">{formatAmount(money.paid, money.currency)}</dd>
        <dt className="font-medium">Balance</dt>
        <dd className="text-right font-medium">{formatAmount(money.balance, money.currency)}</dd>
      </dl>
    </Card>
  );
}
