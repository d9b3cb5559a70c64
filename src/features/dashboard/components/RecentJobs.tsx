import type { ReactNode } from 'react';
import type { JobSummary } from '../../../../shared/api/list';
import {
  Card,
  DataTable,
  EmptyState,
  QueryState,
  TextLink,
  tableColumnHelper,
} from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { useRecentJobs } from '../api/dashboard-queries';

const column = tableColumnHelper<JobSummary>();
const staffColumns = column.columns([
  column.accessor('name', {
    header: 'Job',
    cell: (info) => <TextLink to={`/jobs/${info.row.original.id}`}>{info.getValue()}</TextLink>,
  }),
  column.accessor('customerName', { header: 'Builder' }),
  column.accessor('address', { header: 'Site' }),
  column.accessor('createdAt', { header: 'Created', cell: (info) => formatDate(info.getValue()) }),
]);
const builderColumns = column.columns([
  column.accessor('name', {
    header: 'Job',
    cell: (info) => <span className="font-medium text-sand-900">{info.getValue()}</span>,
  }),
  column.accessor('address', { header: 'Site' }),
  column.accessor('planRevision', { header: 'Plan rev.', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('createdAt', { header: 'Created', cell: (info) => formatDate(info.getValue()) }),
]);

/** Props of {@link RecentJobs}. */
export interface RecentJobsProps {
  title?: string;
  /** Builders see their own jobs, so the builder column is dropped. */
  forBuilder?: boolean;
  emptyText?: string;
  actions?: ReactNode;
}

/** The newest jobs in a card, with loading and error states. */
export function RecentJobs({
  title = 'Recent jobs',
  forBuilder,
  emptyText,
  actions,
}: RecentJobsProps) {
  const jobs = useRecentJobs();
  return (
    <Card title={title} actions={actions} flush>
      <QueryState query={jobs} what="recent jobs">
        {(page) => (
          <DataTable
            caption={title}
            columns={forBuilder ? builderColumns : staffColumns}
            data={page.items}
            rowKey={(j) => j.id}
            rowHref={forBuilder ? undefined : (j) => `/jobs/${j.id}`}
            empty={<EmptyState title="No jobs yet">{emptyText}</EmptyState>}
          />
        )}
      </QueryState>
    </Card>
  );
}
