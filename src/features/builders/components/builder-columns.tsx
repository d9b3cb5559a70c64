import type { CustomerSummary } from '../../../../shared/api/list';
import { TERMS } from '../../../../shared/api/terms';
import { Badge, TextLink, tableColumnHelper } from '../../../components/ui';

const column = tableColumnHelper<CustomerSummary>();

/** Columns the server can sort builders by (server/routes/customers: name, city, terms). */
export const BUILDER_SORT_COLUMNS = ['name', 'city', 'terms'] as const;

/** Badge of a builder's payment terms. */
export function TermsBadge({ terms }: { terms: CustomerSummary['terms'] }) {
  return terms === 'account' ? (
    <Badge tone="success">{TERMS.account}</Badge>
  ) : (
    <Badge tone="warning">{TERMS.deposit}</Badge>
  );
}

/** Columns of the builders table; the name links to the builder's page. */
export const builderColumns = column.columns([
  column.accessor('name', {
    header: 'Builder company',
    cell: (info) => <TextLink to={`/builders/${info.row.original.id}`}>{info.getValue()}</TextLink>,
  }),
  column.accessor('email', { header: 'E-mail' }),
  column.accessor('phone', { header: 'Phone', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('city', { header: 'City', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('terms', {
    header: 'Terms',
    cell: (info) => <TermsBadge terms={info.getValue()} />,
  }),
  column.accessor('jobCount', {
    header: 'Jobs',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
]);
