import { useState } from 'react';
import { useNavigate } from 'react-router';
import {
  Button,
  Card,
  DataTable,
  Dialog,
  EmptyState,
  Pager,
  QueryState,
} from '../../../components/ui';
import { useCreateJob } from '../api/create-job';
import { useJobs } from '../api/list-jobs';
import { builderJobColumns } from './job-columns';
import { EMPTY_JOB } from './job-form-values';
import { JobForm } from './JobForm';

/** Props of {@link BuilderJobs}. */
export interface BuilderJobsProps {
  customerId: number;
  customerName: string;
  /** Sales and admin may add jobs. */
  canEdit: boolean;
}

const PAGE_SIZE = 10;

/** A builder's jobs (`GET /api/jobs?customerId=`), newest first, with "New job". */
export function BuilderJobs({ customerId, customerName, canEdit }: BuilderJobsProps) {
  const [page, setPage] = useState(1);
  const jobs = useJobs({ customerId, page, pageSize: PAGE_SIZE, sort: '-createdAt' });
  const create = useCreateJob(customerId);
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const close = () => {
    setAdding(false);
    create.reset();
  };

  return (
    <Card
      title="Jobs"
      flush
      actions={canEdit ? <Button onClick={() => setAdding(true)}>New job</Button> : null}
    >
      <QueryState query={jobs} what="jobs">
        {(result) => (
          <>
            <DataTable
              caption={`Jobs of ${customerName}`}
              columns={builderJobColumns}
              data={result.items}
              rowKey={(job) => job.id}
              rowHref={(job) => `/jobs/${job.id}`}
              empty={
                <EmptyState title="No jobs yet">
                  {canEdit ? 'Add the builder’s first site with “New job”.' : null}
                </EmptyState>
              }
            />
            {result.total > PAGE_SIZE ? (
              <Pager
                page={result.page}
                pageSize={result.pageSize}
                total={result.total}
                onPage={setPage}
              />
            ) : null}
          </>
        )}
      </QueryState>
      <Dialog open={adding} title={`New job for ${customerName}`} onClose={close} wide>
        <JobForm
          mode="create"
          defaultValues={EMPTY_JOB}
          busy={create.isPending}
          error={create.error}
          onCancel={close}
          onSubmit={(values) =>
            create.mutate(values, { onSuccess: (job) => void navigate(`/jobs/${job.id}`) })
          }
        />
      </Dialog>
    </Card>
  );
}
