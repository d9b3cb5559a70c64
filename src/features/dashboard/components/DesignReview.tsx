import type { Me } from '../../../../shared/api/auth';
import { Card, EmptyState, PageHeader } from '../../../components/ui';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';

/** Engineer landing page: "Design review". */
export function DesignReview({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Design review"
        description={`Truss designs of ${me.plant.name} waiting for review.`}
      />
      <div className="grid gap-6">
        <CautionsPanel />
        <Card title="Waiting for review">
          <EmptyState title="Nothing is waiting for review">
            Designs the sales desk sends for review will appear here, with their loads, member
            checks and plates, for you to approve or return.
          </EmptyState>
        </Card>
        <RecentJobs
          actions={<TextLink to="/jobs">All jobs</TextLink>}
          emptyText="No jobs have been entered yet."
        />
      </div>
    </>
  );
}
