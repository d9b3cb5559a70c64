import type { Me } from '../../../../shared/api/auth';
import { Card, EmptyState, PageHeader } from '../../../components/ui';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';

/** Foreman landing page: "Shop floor". */
export function ShopFloor({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Shop floor"
        description={`Work coming to the tables at ${me.plant.name}.`}
      />
      <div className="grid gap-6">
        <CautionsPanel />
        <Card title="Coming up">
          <EmptyState title="No orders released to production yet">
            Orders appear here once their design is approved and the deposit or account terms are
            settled, with cut lists and plate schedules for each line.
          </EmptyState>
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
