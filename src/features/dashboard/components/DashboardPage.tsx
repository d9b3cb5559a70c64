import type { Me } from '../../../../shared/api/auth';
import { AdminOverview } from './AdminOverview';
import { BuilderJobs } from './BuilderJobs';
import { DesignReview } from './DesignReview';
import { SalesDesk } from './SalesDesk';
import { ShopFloor } from './ShopFloor';

/** The landing page (`/`) of the signed-in user's role. */
export function DashboardPage({ me }: { me: Me }) {
  switch (me.user.role) {
    case 'admin':
      return <AdminOverview me={me} />;
    case 'sales':
      return <SalesDesk me={me} />;
    case 'engineer':
      return <DesignReview me={me} />;
    case 'foreman':
      return <ShopFloor me={me} />;
    case 'builder':
      return <BuilderJobs me={me} />;
  }
}
