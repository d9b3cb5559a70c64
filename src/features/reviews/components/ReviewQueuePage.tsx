import { Link } from 'react-router';
import type { ReviewQueueItem } from '../../../../shared/api/orders';
import { CsiBadge } from '../../../components/truss/MemberTable';
import {
  Badge,
  EmptyState,
  PagedTable,
  PageHeader,
  tableColumnHelper,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useListParams } from '../../../lib/use-list-params';
import { useReviewQueue } from '../api/list-reviews';
import { reviewPath } from '../review-link';

const column = tableColumnHelper<ReviewQueueItem>();
const columns = column.columns([
  column.accessor('mark', {
    header: 'Mark',
    cell: (info) => (
      <Link
        to={reviewPath(info.row.original.id, info.row.original.order.id)}
        className="font-semibold text-timber-700 underline underline-offset-2 hover:text-timber-800"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor((row) => row.order.number, { id: 'order', header: 'Order' }),
  column.accessor((row) => row.customer.name, { id: 'builder', header: 'Builder' }),
  column.accessor((row) => row.job.name, { id: 'job', header: 'Job' }),
  column.accessor('description', { header: 'Truss' }),
  column.accessor('maxCsi', {
    header: 'Max CSI',
    cell: (info) => {
      const csi = info.getValue();
      return csi === null ? '—' : <CsiBadge csi={csi} />;
    },
  }),
  column.accessor('designOk', {
    header: 'Design',
    cell: (info) =>
      info.getValue() ? <Badge tone="success">Passes</Badge> : <Badge tone="danger">Fails</Badge>,
  }),
  column.accessor('updatedAt', {
    header: 'Designed',
    cell: (info) => formatDateTime(info.getValue()),
  }),
]);

/** `/reviews`: lines waiting for the design reviewer, passing designs first (server order). */
export function ReviewQueuePage() {
  const { params, update } = useListParams();
  const queue = useReviewQueue(params);
  return (
    <>
      <PageHeader
        title="Review queue"
        description="Truss designs waiting for review. Open a mark to check it and decide."
      />
      <PagedTable
        query={queue}
        what="the review queue"
        caption="Designs waiting for review"
        columns={columns}
        rowKey={(item) => item.id}
        rowHref={(item) => reviewPath(item.id, item.order.id)}
        empty={<EmptyState title="Nothing to review" />}
        onPage={(p) => update({ page: p })}
      />
    </>
  );
}
