import type { ReactNode } from 'react';
import type { JobDetail } from '../../../../shared/api/jobs';
import {
  DetailList,
  EditInPlace,
  LinkButton,
  PageHeader,
  QueryState,
  TextLink,
} from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { areaLoadUnit, formatAreaLoad } from '../../../lib/units';
import { useJob, useUpdateJob } from '../api/job';
import { jobFormValues } from './job-form-values';
import { JobForm } from './JobForm';

/** Props of {@link JobPage}. */
export interface JobPageProps {
  id: number;
  /** Sales and admin edit jobs and start orders. */
  canEdit: boolean;
  /** Builders' staff see the builder's page link; others see the name only. */
  canOpenBuilder: boolean;
  /** Staff have the jobs list to go back to; builders go back to their start page. */
  canListJobs: boolean;
  /** The job's orders panel (from the orders feature; the router composes the two). */
  orders: (job: JobDetail) => ReactNode;
}

const LOAD_KEYS = ['tcll', 'tcdl', 'bcll', 'bcdl'] as const;

function EffectiveLoads({ job }: { job: JobDetail }) {
  const overrides = job.criteria.loads ?? {};
  return (
    <div>
      <h3 className="mb-2 text-sm font-semibold text-sand-900">
        Design loads ({areaLoadUnit(job.units)})
      </h3>
      <table className="w-full max-w-xl text-left text-sm">
        <caption className="sr-only">Effective design loads of this job</caption>
        <thead className="text-xs font-semibold tracking-wide text-sand-600 uppercase">
          <tr>
            {LOAD_KEYS.map((key) => (
              <th key={key} scope="col" className="py-1 pr-4">
                {key.toUpperCase()}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          <tr>
            {LOAD_KEYS.map((key) => (
              <td key={key} className="py-1 pr-4 text-base text-sand-900 tabular-nums">
                {formatAreaLoad(job.effectiveLoads[key], job.units)}
                <span className="block text-xs text-sand-600">
                  {overrides[key] === undefined ? 'plant default' : 'set for this job'}
                </span>
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}

function Details({
  job,
  canEdit,
  canOpenBuilder,
}: { job: JobDetail } & Pick<JobPageProps, 'canEdit' | 'canOpenBuilder'>) {
  const update = useUpdateJob(job.id);
  const c = job.criteria;
  return (
    <EditInPlace
      title="Site and design criteria"
      editTitle="Edit job"
      editLabel="Edit job"
      canEdit={canEdit}
      savedMessage="The job was saved. New truss lines start from these loads."
      form={({ saved, cancel }) => (
        <JobForm
          mode="edit"
          defaultValues={jobFormValues(job)}
          busy={update.isPending}
          error={update.error}
          onCancel={() => {
            cancel();
            update.reset();
          }}
          onSubmit={(values) => update.mutate(values, { onSuccess: saved })}
        />
      )}
    >
      <div className="flex flex-col gap-6">
        <DetailList
          items={[
            {
              label: 'Builder',
              value: canOpenBuilder ? (
                <TextLink to={`/builders/${job.customer.id}`}>{job.customer.name}</TextLink>
              ) : (
                job.customer.name
              ),
            },
            { label: 'Site address', value: job.address },
            { label: 'Plan revision', value: job.planRevision ?? '—' },
            { label: 'Created', value: formatDate(job.createdAt) },
            { label: 'Ground snow load', value: formatAreaLoad(c.groundSnow, job.units) },
            { label: 'Wind uplift', value: formatAreaLoad(c.windUplift, job.units) },
            { label: 'Exposure notes', value: c.exposureNotes || '—' },
          ]}
        />
        <EffectiveLoads job={job} />
        <p className="text-xs text-sand-600">
          Loads must be confirmed by the building designer; local codes govern.
        </p>
      </div>
    </EditInPlace>
  );
}

/** `/jobs/:id`: a job's site, plan revision, criteria and effective loads, and its orders. */
export function JobPage({ id, canEdit, canOpenBuilder, canListJobs, orders }: JobPageProps) {
  const job = useJob(id);
  return (
    <QueryState query={job} what="the job">
      {(j) => (
        <>
          <p className="mb-2 text-sm">
            {canListJobs ? (
              <TextLink to="/jobs">← Jobs</TextLink>
            ) : (
              <TextLink to="/">← Your jobs</TextLink>
            )}
          </p>
          <PageHeader
            title={j.name}
            description={`${j.customer.name} · ${j.address}`}
            actions={
              <LinkButton to={`/jobs/${j.id}/files`} variant="secondary">
                Plans
              </LinkButton>
            }
          />
          <div className="grid gap-6">
            <Details key={j.id} job={j} canEdit={canEdit} canOpenBuilder={canOpenBuilder} />
            {orders(j)}
          </div>
        </>
      )}
    </QueryState>
  );
}
