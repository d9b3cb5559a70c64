import type { JobSummary } from '../../../../shared/api/list';
import { TextLink, tableColumnHelper } from '../../../components/ui';
import { formatDate } from '../../../lib/format';

const column = tableColumnHelper<JobSummary>();

/** Columns the server can sort jobs by (server/routes/jobs: name, createdAt, customerName). */
export const JOB_SORT_COLUMNS = ['name', 'createdAt', 'customerName'] as const;

const nameColumn = column.accessor('name', {
  header: 'Job',
  cell: (info) => <TextLink to={`/jobs/${info.row.original.id}`}>{info.getValue()}</TextLink>,
});
const addressColumn = column.accessor('address', { header: 'Site address' });
const revisionColumn = column.accessor('planRevision', {
  header: 'Plan rev.',
  cell: (info) => info.getValue() ?? '—',
});
const createdColumn = column.accessor('createdAt', {
  header: 'Created',
  cell: (info) => formatDate(info.getValue()),
});

/** Columns of the jobs table; the name links to the job's page. */
export const jobColumns = column.columns([
  nameColumn,
  column.accessor('customerName', { header: 'Builder' }),
  addressColumn,
  revisionColumn,
  createdColumn,
]);

/** Columns of one builder's jobs (the builder column would repeat on every row). */
export const builderJobColumns = column.columns([
  nameColumn,
  addressColumn,
  revisionColumn,
  createdColumn,
]);
