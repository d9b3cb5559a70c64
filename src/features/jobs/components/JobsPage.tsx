import type { JobSummary } from '../../../../shared/api/list';
import {
  Card,
  DataTable,
  EmptyState,
  PageHeader,
  Pager,
  QueryState,
  SearchBox,
  tableColumnHelper,
} from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { useListParams } from '../../../lib/use-list-params';
import { useJobs } from '../api/list-jobs';

const column = tableColumnHelper<JobSummary>();
const columns = column.columns([
  column.accessor('name', {
    header: 'Job',
    cell: (info) => <span className="font-medium text-sand-900">{info.getValue()}</span>,
  }),
  column.accessor('customerName', { header: 'Builder' }),
  column.accessor('address', { header: 'Site address' }),
  column.accessor('planRevision', { header: 'Plan rev.', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('createdAt', { header: 'Created', cell: (info) => formatDate(info.getValue()) }),
]);

/** `/jobs`: every job of the plant, searchable and paged through the URL. */
export function JobsPage() {
  const { params, update } = useListParams();
  const jobs = useJobs(params);
  return (
    <>
      <PageHeader title="Jobs" description="Every job of the plant, newest first." />
      <div className="mb-4">
        <SearchBox
          label="Search jobs"
          placeholder="Job, builder or address"
          value={params.q}
          onSearch={(q) => update({ q, page: 1 })}
        />
      </div>
      <Card flush>
        <QueryState query={jobs} what="jobs">
          {(page) => (
            <>
              <DataTable
                caption="Jobs"
                columns={columns}
                data={page.items}
                rowKey={(job) => job.id}
                empty={
                  <EmptyState title={params.q ? `No jobs match “${params.q}”` : 'No jobs yet'} />
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
