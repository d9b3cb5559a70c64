import { Card, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { usePlanJob } from '../api/get-job';
import { usePlanFiles } from '../api/list-plan-files';
import { PlanFileList } from './PlanFileList';
import { UploadArea } from './UploadArea';

/** Props of {@link PlanFilesPage}. */
export interface PlanFilesPageProps {
  jobId: number;
  /** The sales desk, the plant manager and the job's builder upload; others read. */
  canUpload: boolean;
}

function Files({ jobId }: { jobId: number }) {
  const files = usePlanFiles(jobId);
  return (
    <QueryState query={files} what="the plans">
      {(rows) => <PlanFileList jobId={jobId} files={rows} />}
    </QueryState>
  );
}

/** `/jobs/:jobId/files`: the builder's plans of one job, with an upload area where allowed. */
export function PlanFilesPage({ jobId, canUpload }: PlanFilesPageProps) {
  const job = usePlanJob(jobId);
  return (
    <QueryState query={job} what="the job">
      {(j) => (
        <>
          <p className="mb-2 text-sm">
            <TextLink to={`/jobs/${j.id}`}>← {j.name}</TextLink>
          </p>
          <PageHeader
            title={`Plans for ${j.name}`}
            description={`${j.customer.name} · ${j.address}`}
          />
          <div className="grid gap-6">
            {canUpload ? (
              <Card title="Upload a plan">
                <UploadArea jobId={j.id} />
              </Card>
            ) : null}
            <Card title="Plans" flush>
              <Files jobId={j.id} />
            </Card>
          </div>
        </>
      )}
    </QueryState>
  );
}
