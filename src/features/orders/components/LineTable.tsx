import { useMemo } from 'react';
import { Link } from 'react-router';
import type { LineSummary } from '../../../../shared/api/orders';
import { DataTable, tableColumnHelper, type TableColumn } from '../../../components/ui';
import { designStateText } from '../line-order';
import { LineActions, type LineActionsProps } from './LineActions';
import { ReviewBadge } from './StatusBadge';

const column = tableColumnHelper<LineSummary>();

function LockIcon() {
  return (
    <svg viewBox="0 0 16 16" className="h-3.5 w-3.5 shrink-0 text-success-700" aria-hidden="true">
      <rect x="3" y="7" width="10" height="7" rx="1.5" fill="currentColor" />
      <path d="M5 7V5a3 3 0 0 1 6 0v2" stroke="currentColor" strokeWidth="1.6" fill="none" />
    </svg>
  );
}

function ReviewCell({ line }: { line: LineSummary }) {
  return (
    <div className="flex max-w-xs flex-col gap-1">
      <span className="inline-flex items-center gap-1.5">
        {line.reviewState === 'approved' ? <LockIcon /> : null}
        <ReviewBadge state={line.reviewState} />
      </span>
      {line.reviewState === 'returned' && line.reviewComment ? (
        <span className="text-xs text-danger-800">
          “{line.reviewComment}”{line.reviewedBy ? ` — ${line.reviewedBy}` : ''}
        </span>
      ) : null}
      {line.reviewState === 'approved' ? (
        <span className="text-xs text-sand-600">
          Locked{line.reviewedBy ? ` · approved by ${line.reviewedBy}` : ''} · a change needs a new
          design and a new review.
        </span>
      ) : null}
    </div>
  );
}

const markColumn = (href?: (line: LineSummary) => string) =>
  column.accessor('mark', {
    header: 'Mark',
    cell: (info) =>
      href ? (
        <Link
          to={href(info.row.original)}
          className="font-mono font-semibold text-timber-700 underline underline-offset-2"
        >
          {info.getValue()}
        </Link>
      ) : (
        <span className="font-mono font-semibold text-sand-900">{info.getValue()}</span>
      ),
  });

const restColumns = [
  column.accessor('quantity', {
    header: 'Qty',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
  column.accessor('plies', {
    header: 'Plies',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
  column.accessor('description', {
    header: 'Description',
    cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
  }),
  column.display({
    id: 'design',
    header: 'Design',
    cell: ({ row }) => (
      <span className="flex flex-col gap-0.5">
        <span
          className={row.original.designOk ? 'text-success-800' : 'font-medium text-danger-700'}
        >
          {designStateText(row.original)}
        </span>
        {row.original.loadsOutOfDate ? (
          <span className="text-xs font-medium text-warning-800">Old loads · redesign</span>
        ) : null}
      </span>
    ),
  }),
  column.display({
    id: 'review',
    header: 'Review',
    cell: ({ row }) => <ReviewCell line={row.original} />,
  }),
] as TableColumn<LineSummary>[];

/** Props of {@link LineTable}. Without `actions` the table is read-only (builders, shop, review). */
export interface LineTableProps {
  orderId: number;
  lines: LineSummary[];
  actions?: Omit<LineActionsProps, 'orderId' | 'line' | 'first' | 'last' | 'busy'> & {
    busyLineId: number | null;
  };
  /** Makes each mark a link (to its design or its review). */
  markHref?: (line: LineSummary) => string;
}

/** The order's truss lines in their order, with design and review state. */
export function LineTable({ orderId, lines, actions, markHref }: LineTableProps) {
  const sorted = useMemo(() => [...lines].sort((a, b) => a.position - b.position), [lines]);
  const lastId = sorted.at(-1)?.id;
  const firstId = sorted[0]?.id;
  const columns = useMemo(() => {
    const base = [markColumn(markHref), ...restColumns] as TableColumn<LineSummary>[];
    if (!actions) return base;
    const { busyLineId, ...handlers } = actions;
    return [
      ...base,
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => (
          <LineActions
            orderId={orderId}
            line={row.original}
            first={row.original.id === firstId}
            last={row.original.id === lastId}
            busy={busyLineId !== null}
            {...handlers}
          />
        ),
      }),
    ] as TableColumn<LineSummary>[];
  }, [actions, orderId, firstId, lastId, markHref]);

  return (
    <DataTable
      caption="Truss lines"
      columns={columns}
      data={sorted}
      rowKey={(line) => line.id}
      rowClassName={(line) =>
        line.reviewState === 'approved' ? 'bg-success-50/40 hover:bg-success-50' : undefined
      }
    />
  );
}
