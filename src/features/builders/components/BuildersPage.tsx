import type { CustomerSummary } from '../../../../shared/api/list';
import {
  Badge,
  Card,
  DataTable,
  EmptyState,
  PageHeader,
  Pager,
  QueryState,
  SearchBox,
  tableColumnHelper,
} from '../../../components/ui';
import { useListParams } from '../../../lib/use-list-params';
import { useCustomers } from '../api/list-customers';

const column = tableColumnHelper<CustomerSummary>();
const columns = column.columns([
  column.accessor('name', {
    header: 'Builder company',
    cell: (info) => <span className="font-medium text-sand-900">{info.getValue()}</span>,
  }),
  column.accessor('email', { header: 'E-mail' }),
  column.accessor('phone', { header: 'Phone', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('city', { header: 'City', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('terms', {
    header: 'Terms',
    cell: (info) =>
      info.getValue() === 'account' ? (
        <Badge tone="success">Account</Badge>
      ) : (
        <Badge tone="warning">Deposit</Badge>
      ),
  }),
  column.accessor('jobCount', {
    header: 'Jobs',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
]);

/** `/builders`: the plant's builder companies, searchable and paged through the URL. */
export function BuildersPage() {
  const { params, update } = useListParams();
  const customers = useCustomers(params);
  return (
    <>
      <PageHeader
        title="Builders"
        description="Builder companies the plant supplies, with their payment terms."
      />
      <div className="mb-4">
        <SearchBox
          label="Search builders"
          placeholder="Company, e-mail or city"
          value={params.q}
          onSearch={(q) => update({ q, page: 1 })}
        />
      </div>
      <Card flush>
        <QueryState query={customers} what="builder companies">
          {(page) => (
            <>
              <DataTable
                caption="Builder companies"
                columns={columns}
                data={page.items}
                rowKey={(c) => c.id}
                empty={
                  <EmptyState
                    title={
                      params.q ? `No builders match “${params.q}”` : 'No builder companies yet'
                    }
                  />
                }
              />
              <Pager
                page={page.page}
                pageSize={page.pageSize}
                total={page.total}
                onPage={(p) => update({ page: p })}
              />
            </>
          )}
        </QueryState>
      </Card>
    </>
  );
}
