import type { OrderSummary } from '../../../../shared/api/orders';
import { TextLink, tableColumnHelper } from '../../../components/ui';
import { formatDate, formatDateTime } from '../../../lib/format';
import { OrderStatusBadge } from './StatusBadge';

const column = tableColumnHelper<OrderSummary>();

/** Columns the server sorts orders by (the brief: number, created, updated). */
export const ORDER_SORT_COLUMNS = ['number', 'createdAt', 'updatedAt'] as const;

/** Columns of the orders table; the number links to the order's page. */
export const orderColumns = column.columns([
  column.accessor('number', {
    header: 'Order',
    cell: (info) => (
      <TextLink className="whitespace-nowrap" to={`/orders/${info.row.original.id}`}>
        {info.getValue()}
      </TextLink>
    ),
  }),
  column.accessor('status', {
    header: 'Status',
    cell: (info) => <OrderStatusBadge status={info.getValue()} />,
  }),
  column.accessor((order) => order.customer.name, { id: 'builder', header: 'Builder' }),
  column.accessor((order) => order.job.name, { id: 'job', header: 'Job' }),
  column.accessor('trussCount', {
    header: 'Trusses',
    cell: (info) => (
      <span className="tabular-nums">
        {info.getValue()}
        <span className="text-sand-600">
          {' '}
          in {info.row.original.lineCount} line{info.row.original.lineCount === 1 ? '' : 's'}
        </span>
      </span>
    ),
  }),
  column.accessor('createdAt', {
    header: 'Created',
    cell: (info) => formatDate(info.getValue()),
  }),
  column.accessor('updatedAt', {
    header: 'Updated',
    cell: (info) => formatDateTime(info.getValue()),
  }),
]);
