import { useState, type ReactNode } from 'react';
import { useLocation } from 'react-router';
import { linesMayChange, type LineSummary, type OrderDetail } from '../../../../shared/api/orders';
import {
  Alert,
  Button,
  Card,
  Dialog,
  EmptyState,
  ErrorMessage,
  LinkButton,
  QueryState,
  TextLink,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useCopyLine, useDeleteLine, useOrder, useReorderLines } from '../api/order';
import { movedLineIds } from '../line-order';
import { LineTable } from './LineTable';
import { OrderHistory } from './OrderHistory';
import { OrderStatusBadge } from './StatusBadge';
import { OutOfDateLines } from './OutOfDateLines';

/** Props of {@link OrderPage}. */
export interface OrderPageProps {
  id: number;
  /** Sales and admin add, change, copy, delete and reorder lines. */
  canEdit: boolean;
  /** Staff who may open the job's page (builders see the job name only). */
  canOpenJob: boolean;
  /** Sales, admin and the order's builder read its quotes. */
  canSeeQuotes?: boolean;
  /** The foreman, sales and admin open shop paper (cut lists, lumber plan, plates, tags) once every line is approved. */
  canSeeShop?: boolean;
  /** Where a line's mark leads (its design, or its review); none for builders. */
  markHref?: (orderId: number, line: LineSummary) => string;
  /** The desk's payments, balance and mail states (composed in by the app, sales and admin only). */
  payments?: (order: OrderDetail) => ReactNode;
  /** Production facts and changes (promised date, hold, release, delivery), composed by the app. */
  production?: (order: OrderDetail) => ReactNode;
}

function Header({
  order,
  canEdit,
  canOpenJob,
  canSeeQuotes,
  canSeeShop,
}: { order: OrderDetail } & Omit<OrderPageProps, 'id'>) {
  const approved = order.lines.length > 0 && order.lines.every((l) => l.reviewState === 'approved');
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold tracking-tight text-sand-900">
            Order {order.number}
          </h1>
          <OrderStatusBadge status={order.status} />
        </div>
        <p className="mt-1 text-base text-sand-600">
          {order.customer.name} ·{' '}
          {canOpenJob ? (
            <TextLink to={`/jobs/${order.job.id}`}>{order.job.name}</TextLink>
          ) : (
            order.job.name
          )}{' '}
          · {order.lineCount} line{order.lineCount === 1 ? '' : 's'}, {order.trussCount} truss
          {order.trussCount === 1 ? '' : 'es'} · updated {formatDateTime(order.updatedAt)}
        </p>
      </div>
      <div className="flex items-center gap-2">
        {canSeeShop && approved ? (
          <LinkButton to={`/shop/orders/${order.id}/lumber-plan`} variant="secondary">
            Lumber plan
          </LinkButton>
        ) : null}
        {canSeeShop && approved ? (
          <LinkButton to={`/orders/${order.id}/shop-paper`} variant="secondary">
            Shop paper
          </LinkButton>
        ) : null}
        {canSeeQuotes ? (
          <LinkButton to={`/orders/${order.id}/quotes`} variant="secondary">
            Quotes
          </LinkButton>
        ) : null}
        {canEdit ? <LinkButton to={`/orders/${order.id}/lines/new`}>Add truss</LinkButton> : null}
      </div>
    </div>
  );
}

/**
 * After a move the row is re-rendered (its buttons were disabled meanwhile): put keyboard focus
 * back on the same move button of the moved line, or its other one at the top or bottom.
 */
function keepFocusOnMove(mark: string, step: -1 | 1) {
  requestAnimationFrame(() => {
    const button = (dir: string) =>
      document.querySelector<HTMLButtonElement>(`button[aria-label="Move ${mark} ${dir}"]`);
    const same = button(step < 0 ? 'up' : 'down');
    (same && !same.disabled ? same : button(step < 0 ? 'down' : 'up'))?.focus();
  });
}

function Lines({
  order,
  canEdit,
  markHref,
}: {
  order: OrderDetail;
  canEdit: boolean;
  markHref?: (line: LineSummary) => string;
}) {
  const copy = useCopyLine(order.id);
  const remove = useDeleteLine(order.id);
  const reorder = useReorderLines(order.id);
  const [deleting, setDeleting] = useState<LineSummary | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const failed = copy.error ?? reorder.error;
  const busyLineId = copy.isPending
    ? copy.variables
    : reorder.isPending
      ? (reorder.variables[0] ?? null)
      : null;

  const onMove = (line: LineSummary, step: -1 | 1) => {
    const lineIds = movedLineIds(order.lines, line.id, step);
    if (lineIds) reorder.mutate(lineIds, { onSettled: () => keepFocusOnMove(line.mark, step) });
  };
  const confirmDelete = () => {
    if (!deleting) return;
    remove.mutate(deleting.id, {
      onSuccess: () => {
        setNotice(`Truss ${deleting.mark} was deleted.`);
        setDeleting(null);
      },
    });
  };

  return (
    <Card title="Truss lines" flush>
      {notice ? (
        <Alert tone="success" className="m-4">
          {notice}
        </Alert>
      ) : null}
      {failed ? <ErrorMessage className="m-4" title="That did not work" error={failed} /> : null}
      <OutOfDateLines orderId={order.id} lines={order.lines} canEdit={canEdit} />
      {order.lines.length === 0 ? (
        <EmptyState
          title="No trusses on this order yet"
          action={
            canEdit ? <LinkButton to={`/orders/${order.id}/lines/new`}>Add truss</LinkButton> : null
          }
        >
          {canEdit ? 'Each truss line is one design, built the quantity you set.' : null}
        </EmptyState>
      ) : (
        <LineTable
          orderId={order.id}
          lines={order.lines}
          markHref={markHref}
          actions={
            canEdit
              ? {
                  busyLineId,
                  onCopy: (line) =>
                    copy.mutate(line.id, {
                      onSuccess: (copied) =>
                        setNotice(`Truss ${line.mark} was copied as ${copied.mark}.`),
                    }),
                  onDelete: (line) => {
                    remove.reset();
                    setDeleting(line);
                  },
                  onMove,
                }
              : undefined
          }
        />
      )}
      <Dialog
        open={deleting !== null}
        title={`Delete truss ${deleting?.mark ?? ''}?`}
        onClose={() => setDeleting(null)}
        footer={
          <>
            <Button variant="secondary" onClick={() => setDeleting(null)}>
              Keep it
            </Button>
            <Button variant="danger" busy={remove.isPending} onClick={confirmDelete}>
              Delete truss
            </Button>
          </>
        }
      >
        <p>The line and its design are removed from order {order.number}. This cannot be undone.</p>
        {deleting?.reviewState === 'approved' ? (
          <p className="mt-2">Its design review approval goes with it.</p>
        ) : null}
        {remove.error ? (
          <ErrorMessage className="mt-3" title="The truss was not deleted" error={remove.error} />
        ) : null}
      </Dialog>
    </Card>
  );
}

/** `/orders/:id`: the order's header, its truss lines and their actions, and its history. */
export function OrderPage({
  id,
  canEdit,
  canOpenJob,
  canSeeQuotes = false,
  canSeeShop = false,
  markHref,
  payments,
  production,
}: OrderPageProps) {
  const order = useOrder(id);
  const saved = (useLocation().state as { saved?: string } | null)?.saved;
  return (
    <QueryState query={order} what="the order">
      {(o) => {
        // The desk's line actions only where the server takes them (one rule, shared).
        const editable = canEdit && linesMayChange(o.status);
        return (
          <>
            <p className="mb-2 text-sm print:hidden">
              <TextLink to="/orders">← Orders</TextLink>
            </p>
            <Header
              order={o}
              canEdit={editable}
              canOpenJob={canOpenJob}
              canSeeQuotes={canSeeQuotes}
              canSeeShop={canSeeShop}
            />
            {saved ? (
              <Alert tone="success" className="mb-4">
                {saved}
              </Alert>
            ) : null}
            {!canEdit ? (
              <Alert className="mb-4 print:hidden">
                You can follow this order here; the plant’s sales desk makes the changes.
              </Alert>
            ) : !editable ? (
              <Alert className="mb-4 print:hidden">
                The builder has accepted this order, so its trusses are fixed: open a mark to read
                its design. A change needs a new order or a change agreed with the builder.
              </Alert>
            ) : null}
            <div className="grid grid-cols-[minmax(0,1fr)] gap-6">
              {production?.(o)}
              <Lines
                order={o}
                canEdit={editable}
                markHref={markHref ? (line) => markHref(o.id, line) : undefined}
              />
              {payments?.(o)}
              <OrderHistory entries={o.history} />
            </div>
          </>
        );
      }}
    </QueryState>
  );
}
