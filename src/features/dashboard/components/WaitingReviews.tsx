import { Link } from 'react-router';
import type { ReviewQueueItem } from '../../../../shared/api/orders';
import { Card, DataTable, EmptyState, QueryState, tableColumnHelper } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { useWaitingReviews } from '../api/dashboard-queries';
import { TextLink } from './links';

const column = tableColumnHelper<ReviewQueueItem>();
const columns = column.columns([
  column.accessor('mark', {
    header: 'Mark',
    cell: (info) => (
      <Link
        to={`/reviews/${info.row.original.id}?order=${info.row.original.order.id}`}
        className="font-semibold text-timber-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor((r) => r.order.number, { id: 'order', header: 'Order' }),
  column.accessor((r) => r.customer.name, { id: 'builder', header: 'Builder' }),
  column.accessor('description', { header: 'Truss' }),
  column.accessor('designOk', {
    header: 'Design',
    cell: (info) =>
      info.getValue() ? (
        <span className="text-success-700">
          Passes · CSI {info.row.original.maxCsi?.toFixed(2)}
        </span>
      ) : (
        <span className="text-danger-700">Fails its checks</span>
      ),
  }),
  column.accessor('updatedAt', { header: 'Designed', cell: (info) => formatDate(info.getValue()) }),
]);

/** The first designs in the review queue, each linking to its review page. */
export function WaitingReviews() {
  const reviews = useWaitingReviews();
  return (
    <Card
      title="Waiting for review"
      actions={<TextLink to="/reviews">Open the review queue</TextLink>}
      flush
    >
      <QueryState query={reviews} what="designs waiting for review">
        {(page) => (
          <DataTable
            caption="Waiting for review"
            columns={columns}
            data={page.items}
            rowKey={(r) => r.id}
            empty={
              <EmptyState title="Nothing is waiting for review">
                Designs the sales desk saves appear here, with their loads, member checks and
                plates, for you to approve or send back.
              </EmptyState>
            }
          />
        )}
      </QueryState>
    </Card>
  );
}
