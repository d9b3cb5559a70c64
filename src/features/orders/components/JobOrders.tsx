import { useNavigate } from 'react-router';
import type { JobDetail } from '../../../../shared/api/jobs';
import { Button, Card, EmptyState, ErrorMessage, TextLink } from '../../../components/ui';
import { useCreateOrder } from '../api/order';
import { OrderStatusBadge } from './StatusBadge';

/** Props of {@link JobOrders}. */
export interface JobOrdersProps {
  job: JobDetail;
  /** Sales and admin start orders. */
  canEdit: boolean;
}

/** A job's orders (from the job's detail) with "New order", which opens the new order. */
export function JobOrders({ job, canEdit }: JobOrdersProps) {
  const create = useCreateOrder();
  const navigate = useNavigate();
  const start = () =>
    create.mutate(job.id, { onSuccess: (order) => void navigate(`/orders/${order.id}`) });
  return (
    <Card
      title="Orders"
      flush
      actions={
        canEdit ? (
          <Button onClick={start} busy={create.isPending}>
            New order
          </Button>
        ) : null
      }
    >
      {create.error ? (
        <ErrorMessage className="m-4" title="The order was not started" error={create.error} />
      ) : null}
      {job.orders.length === 0 ? (
        <EmptyState title="No orders for this job yet">
          {canEdit ? 'Start one with “New order”, then add its trusses.' : null}
        </EmptyState>
      ) : (
        <ul className="divide-y divide-sand-200">
          {job.orders.map((order) => (
            <li key={order.id} className="flex flex-wrap items-center gap-3 px-4 py-3 text-sm">
              <TextLink to={`/orders/${order.id}`}>Order {order.number}</TextLink>
              <OrderStatusBadge status={order.status} />
              <span className="ml-auto text-sand-600 tabular-nums">
                {order.lineCount} truss line{order.lineCount === 1 ? '' : 's'}
              </span>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
