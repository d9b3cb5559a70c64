import type { Me } from '../../../../shared/api/auth';
import { PageHeader } from '../../../components/ui';
import { BuildersCard } from './BuildersCard';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';
import { TaskLists } from './TaskLists';

/** Sales landing page: "Sales desk". */
export function SalesDesk({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Sales desk"
        description={`Jobs and builder companies of ${me.plant.name}.`}
      />
      <div className="grid gap-6">
        <TaskLists />
        <CautionsPanel />
        <RecentJobs
          actions={<TextLink to="/jobs">All jobs</TextLink>}
          emptyText="Jobs appear here once entered for a builder."
        />
        <BuildersCard />
      </div>
    </>
  );
}
