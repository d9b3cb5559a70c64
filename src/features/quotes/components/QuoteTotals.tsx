import clsx from 'clsx';
import { depositDueLabel } from '../../../../shared/api/terms';
import type { Quote } from '../../../../shared/api/pricing';
import { formatMoney, formatPercent } from '../money';

/** Subtotal, delivery, tax, total and the deposit due, aligned as on the printed quote. */
export function QuoteTotals({ quote }: { quote: Quote }) {
  const money = (amount: number) => formatMoney(amount, quote.currency);
  const rows: { label: string; value: string; strong?: boolean }[] = [
    { label: 'Subtotal', value: money(quote.subtotal) },
    { label: 'Delivery', value: money(quote.delivery) },
    { label: 'Tax', value: money(quote.tax) },
    { label: 'Total', value: money(quote.total), strong: true },
    {
      label: depositDueLabel(quote.depositRate, formatPercent),
      value: money(quote.depositDue),
      strong: true,
    },
  ];
  return (
    <dl className="ml-auto flex w-full max-w-sm flex-col gap-2 text-base">
      {rows.map((row) => (
        <div
          key={row.label}
          className={clsx(
            'flex justify-between gap-6',
            row.strong ? 'font-semibold text-sand-900' : 'text-sand-700',
            row.label === 'Total' && 'border-t border-sand-200 pt-2',
          )}
        >
          <dt>{row.label}</dt>
          <dd className="text-right tabular-nums">{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}
