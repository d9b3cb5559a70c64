import { useMemo } from 'react';
import type { QuoteLine } from '../../../../shared/api/pricing';
import { DataTable, tableColumnHelper, type TableColumn } from '../../../components/ui';
import { formatMoney } from '../money';

const column = tableColumnHelper<QuoteLine>();

const right = (text: string) => <span className="block text-right tabular-nums">{text}</span>;

const boardFeet = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});

function lineColumns(currency: string): TableColumn<QuoteLine>[] {
  return [
    column.accessor('mark', {
      header: 'Mark',
      cell: (info) => <span className="font-medium text-sand-900">{info.getValue()}</span>,
    }),
    column.accessor('description', { header: 'Description' }),
    column.accessor('quantity', {
      header: () => right('Qty'),
      cell: (info) => right(String(info.getValue())),
    }),
    column.accessor('plies', {
      header: () => right('Plies'),
      cell: (info) => right(String(info.getValue())),
    }),
    column.accessor('boardFeet', {
      header: () => right('Board feet'),
      cell: (info) => right(boardFeet.format(info.getValue())),
    }),
    column.accessor('unitPrice', {
      header: () => right('Unit price'),
      cell: (info) => right(formatMoney(info.getValue(), currency)),
    }),
    column.accessor('lineTotal', {
      header: () => right('Line total'),
      cell: (info) => (
        <span className="block text-right font-medium text-sand-900 tabular-nums">
          {formatMoney(info.getValue(), currency)}
        </span>
      ),
    }),
  ];
}

/** The quote's truss lines at the prices it was made with. */
export function QuoteLines({ lines, currency }: { lines: QuoteLine[]; currency: string }) {
  const columns = useMemo(() => lineColumns(currency), [currency]);
  return (
    <DataTable
      columns={columns}
      data={lines}
      caption="Quoted truss lines"
      rowKey={(line) => line.mark}
    />
  );
}
