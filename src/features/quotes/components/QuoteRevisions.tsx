import type { Quote } from '../../../../shared/api/pricing';
import { TERMS, formatTermsDate } from '../../../../shared/api/terms';
import {
  Badge,
  DataTable,
  EmptyState,
  TextLink,
  tableColumnHelper,
  type TableColumn,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { formatMoney } from '../money';
import { quotePath } from '../quote-path';

const column = tableColumnHelper<Quote>();

const right = (text: string) => <span className="block text-right tabular-nums">{text}</span>;

/** Columns of the revisions list (module scope, so stable); the reference links to the revision. */
const REVISION_COLUMNS: TableColumn<Quote>[] = [
  column.accessor('reference', {
    header: 'Reference',
    cell: (info) => (
      <TextLink to={quotePath(info.row.original.orderId, info.row.original.number)}>
        {info.getValue()}
      </TextLink>
    ),
  }),
  column.accessor('superseded', {
    id: 'state',
    header: 'State',
    cell: (info) =>
      info.getValue() ? <Badge>Superseded</Badge> : <Badge tone="success">Current</Badge>,
  }),
  column.accessor('createdAt', {
    header: 'Created',
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
        {info.row.original.createdBy ? (
          <span className="block text-xs text-sand-600">{info.row.original.createdBy}</span>
        ) : null}
      </span>
    ),
  }),
  column.accessor('total', {
    header: () => right('Total'),
    cell: (info) => right(formatMoney(info.getValue(), info.row.original.currency)),
  }),
  column.accessor('depositDue', {
    header: () => right(TERMS.depositDue),
    cell: (info) => right(formatMoney(info.getValue(), info.row.original.currency)),
  }),
  column.accessor('validUntil', {
    header: TERMS.validUntil,
    cell: (info) => <span className="whitespace-nowrap">{formatTermsDate(info.getValue())}</span>,
  }),
  column.accessor('sentAt', {
    header: 'Sent',
    cell: (info) =>
      info.getValue() ? (
        <span>
          {info.row.original.sentTo ?? 'Sent'}
          <span className="block text-xs whitespace-nowrap text-sand-600">
            {formatDateTime(info.getValue())}
          </span>
        </span>
      ) : (
        <span className="text-sand-600">Not sent</span>
      ),
  }),
];

/** Props of {@link QuoteRevisions}. */
export interface QuoteRevisionsProps {
  quotes: Quote[];
  canCreate: boolean;
}

/** The order's quote revisions, newest first; older ones are marked superseded. */
export function QuoteRevisions({ quotes, canCreate }: QuoteRevisionsProps) {
  return (
    <DataTable
      columns={REVISION_COLUMNS}
      data={quotes}
      caption="Quote revisions"
      rowKey={(q) => q.id}
      rowHref={(q) => quotePath(q.orderId, q.number)}
      empty={
        <EmptyState title="No quotes for this order yet">
          {canCreate
            ? 'Create quote prices every truss line from the price book and keeps it as revision 1.'
            : 'The plant’s sales desk will send you a quote.'}
        </EmptyState>
      }
    />
  );
}
