import type { Me } from '../../../../shared/api/auth';
import { Card, PageHeader } from '../../../components/ui';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';
import { TaskLists } from './TaskLists';

/** Foreman landing page: "Shop floor". */
export function ShopFloor({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Shop floor"
        description={`Work coming to the tables at ${me.plant.name}.`}
      />
      <div className="grid gap-6">
        <TaskLists />
        <CautionsPanel />
        <Card title="Cut lists" actions={<TextLink to="/shop">Ready for the shop</TextLink>}>
          <p className="text-base text-sand-700">
            Every order whose truss designs are all approved has its cut list under{' '}
            <TextLink to="/shop">Ready for the shop</TextLink>: each piece by lumber, longest first,
            with its length, end cuts and count, to print or export.
          </p>
        </Card>
        <RecentJobs
          title="Recent jobs"
          actions={<TextLink to="/jobs">All jobs</TextLink>}
          emptyText="No jobs have been entered yet."
        />
      </div>
    </>
  );
}
