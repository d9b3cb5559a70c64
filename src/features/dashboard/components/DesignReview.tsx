import type { Me } from '../../../../shared/api/auth';
import { PageHeader } from '../../../components/ui';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';
import { TaskLists } from './TaskLists';

/** Engineer landing page: "Design review". */
export function DesignReview({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Design review"
        description={`Truss designs of ${me.plant.name} waiting for review.`}
      />
      <div className="grid gap-6">
        <TaskLists />
        <CautionsPanel />
        <RecentJobs
          actions={<TextLink to="/jobs">All jobs</TextLink>}
          emptyText="No jobs have been entered yet."
        />
      </div>
    </>
  );
}
