import type { Role } from '../../../../shared/api/roles';
import { EmptyState, ListToolbar, PagedTable, PageHeader, SearchBox } from '../../../components/ui';
import { BuilderFilter } from '../../../components/filters/BuilderFilter';
import { useListParams } from '../../../lib/use-list-params';
import { jobListParamsFromSearch, useJobs } from '../api/list-jobs';
import { JOB_SORT_COLUMNS, jobColumns } from './job-columns';

/** `/jobs`: every job of the plant; sort, filter by builder, search and page through the URL. */
export function JobsPage({ role }: { role: Role }) {
  const { params, search, update } = useListParams();
  const query = jobListParamsFromSearch(search);
  const jobs = useJobs(query);
  const filtered = !!(params.q || query.customerId);
  return (
    <>
      <PageHeader
        title="Jobs"
        description="Every job of the plant. Open a job for its site, loads and orders."
      />
      <ListToolbar>
        <SearchBox
          label="Search jobs"
          placeholder="Job, builder or address"
          value={params.q}
          onSearch={(q) => update({ q, page: 1 })}
        />
        <BuilderFilter
          role={role}
          value={query.customerId}
          onChange={(customerId) => update({ filters: { customerId } })}
        />
      </ListToolbar>
      <PagedTable
        query={jobs}
        what="jobs"
        caption="Jobs"
        columns={jobColumns}
        rowKey={(job) => job.id}
        rowHref={(job) => `/jobs/${job.id}`}
        sorting={{
          sort: query.sort,
          onSort: (sort) => update({ sort, page: 1 }),
          columns: JOB_SORT_COLUMNS,
        }}
        empty={
          <EmptyState title={filtered ? 'No jobs match this search' : 'No jobs yet'}>
            {filtered
              ? 'Try other words, or show all builders.'
              : 'Jobs are added from a builder’s page.'}
          </EmptyState>
        }
        onPage={(p) => update({ page: p })}
      />
    </>
  );
}
