import type { Me } from '../../../../shared/api/auth';
import { ROLE_LABELS, ROLES } from '../../../../shared/api/roles';
import { ErrorMessage, PageHeader } from '../../../components/ui';
import { countUsersByRole } from '../user-counts';
import { useBuilders, useRecentJobs, useUsersOverview } from '../api/dashboard-queries';
import { CautionsPanel } from './CautionsPanel';
import { TextLink } from './links';
import { RecentJobs } from './RecentJobs';
import { TaskLists } from './TaskLists';
import { StatTile } from './StatTile';

/** Admin landing page: "Plant overview". */
export function AdminOverview({ me }: { me: Me }) {
  const users = useUsersOverview();
  const builders = useBuilders();
  const jobs = useRecentJobs();
  const counts = users.data ? countUsersByRole(users.data.items) : undefined;
  const value = (q: { data?: { total: number }; error: unknown }) =>
    q.error ? null : q.data?.total;

  return (
    <>
      <PageHeader
        title="Plant overview"
        description={`${me.plant.name} · people, builder companies and recent work.`}
        actions={<TextLink to="/users">Manage users</TextLink>}
      />
      <div className="grid gap-6">
        <TaskLists />
        <CautionsPanel />
        {users.error ? (
          <ErrorMessage
            title="Could not load users"
            error={users.error}
            onRetry={() => void users.refetch()}
          />
        ) : null}
        <section
          aria-label="Counts"
          className="grid grid-cols-2 gap-4 md:grid-cols-3 xl:grid-cols-6"
        >
          {ROLES.map((role) => (
            <StatTile
              key={role}
              label={ROLE_LABELS[role]}
              value={users.error ? null : counts?.[role]}
              detail="active users"
            />
          ))}
          <StatTile
            label="Builder companies"
            value={value(builders)}
            detail={<TextLink to="/builders">View</TextLink>}
          />
        </section>
        <RecentJobs
          actions={
            <span className="text-sm text-sand-600">
              {jobs.data ? `${jobs.data.total} jobs in total` : null}
            </span>
          }
          emptyText="Jobs appear here as the sales desk enters them."
        />
      </div>
    </>
  );
}
