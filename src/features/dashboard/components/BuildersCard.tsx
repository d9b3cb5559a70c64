import { TERMS } from '../../../../shared/api/terms';
import type { CustomerSummary } from '../../../../shared/api/list';
import {
  Badge,
  Card,
  DataTable,
  EmptyState,
  QueryState,
  tableColumnHelper,
} from '../../../components/ui';
import { useBuilders } from '../api/dashboard-queries';
import { TextLink } from './links';

const column = tableColumnHelper<CustomerSummary>();
const columns = column.columns([
  column.accessor('name', {
    header: 'Builder company',
    cell: (info) => <TextLink to={`/builders/${info.row.original.id}`}>{info.getValue()}</TextLink>,
  }),
  column.accessor('city', { header: 'City', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('terms', {
    header: 'Terms',
    cell: (info) =>
      info.getValue() === 'account' ? (
        <Badge tone="success">{TERMS.account}</Badge>
      ) : (
        <Badge tone="warning">{TERMS.deposit}</Badge>
      ),
  }),
  column.accessor('jobCount', {
    header: 'Jobs',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
]);

/** Builder companies with their payment terms (account or deposit before release). */
export function BuildersCard() {
  const builders = useBuilders();
  return (
    <Card
      title="Builder companies"
      actions={<TextLink to="/builders">All builders</TextLink>}
      flush
    >
      <QueryState query={builders} what="builder companies">
        {(page) => (
          <DataTable
            caption="Builder companies"
            columns={columns}
            data={page.items}
            rowKey={(c) => c.id}
            rowHref={(c) => `/builders/${c.id}`}
            empty={<EmptyState title="No builder companies yet" />}
          />
        )}
      </QueryState>
    </Card>
  );
}
