import type { Me } from '../../../../shared/api/auth';
import { PageHeader } from '../../../components/ui';
import { RecentJobs } from './RecentJobs';

/** Builder landing page: "Your jobs" (the server returns only their company's jobs). */
export function BuilderJobs({ me }: { me: Me }) {
  return (
    <>
      <PageHeader
        title="Your jobs"
        description={
          me.customer
            ? `Jobs of ${me.customer.name} with ${me.plant.name}.`
            : `Your jobs with ${me.plant.name}.`
        }
      />
      <RecentJobs
        title="Jobs"
        forBuilder
        emptyText={`When ${me.plant.name} enters a job for your company, it appears here.`}
      />
    </>
  );
}
