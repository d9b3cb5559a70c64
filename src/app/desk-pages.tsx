/**
 * The desk's pages as route components, loaded lazily by the router (router.tsx `desk(...)`), so the
 * sign-in page and the builder's portal download none of them.
 */
import type { ReactNode } from 'react';
import { useParams } from 'react-router';
import type { Me } from '../../shared/api/auth';
import { useMe } from '../features/auth/api/me';
import { BuilderPage } from '../features/builders/components/BuilderPage';
import { BuildersPage } from '../features/builders/components/BuildersPage';
import { DashboardPage } from '../features/dashboard/components/DashboardPage';
import { BuilderJobs } from '../features/jobs/components/BuilderJobs';
import { JobPage } from '../features/jobs/components/JobPage';
import { JobsPage } from '../features/jobs/components/JobsPage';
import { JobOrders } from '../features/orders/components/JobOrders';
import { OrderPage } from '../features/orders/components/OrderPage';
import { OrderProductionCard } from '../features/schedule/components/OrderProductionCard';
import { OrdersPage } from '../features/orders/components/OrdersPage';
import { UsersPage } from '../features/users/components/UsersPage';
import { DeskPayments } from '../features/payments/components/DeskPayments';
import { RecordAcceptanceCard } from '../features/quotes/components/RecordAcceptance';
import { canManageSales } from '../lib/permissions';
import { SECTION_ROLES } from './navigation';
import { markLinkFor } from './mark-links';

/** The numeric `:id` of a detail route; junk answers 404 instead of a failed request. */
function idParam(value: string | undefined): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such record.', { status: 404 });
  return id;
}

/** Renders a page with the signed-in session and the route's `:id` (the loaders checked both). */
function WithMe({ render }: { render: (me: Me, id: number) => ReactNode }) {
  const me = useMe().data;
  const { id } = useParams();
  return me ? <>{render(me, id === undefined ? 0 : idParam(id))}</> : null;
}

export function HomeRoute() {
  const me = useMe().data;
  return me ? <DashboardPage me={me} /> : null;
}

export function UsersRoute() {
  return <UsersPage />;
}

export function BuildersRoute() {
  return <BuildersPage />;
}

export function BuilderRoute() {
  return (
    <WithMe
      render={(me, id) => (
        <BuilderPage
          id={id}
          canEdit={canManageSales(me.user.role)}
          jobs={(customer) => (
            <BuilderJobs
              customerId={customer.id}
              customerName={customer.name}
              canEdit={canManageSales(me.user.role)}
            />
          )}
        />
      )}
    />
  );
}

export function JobsRoute() {
  return <WithMe render={(me) => <JobsPage role={me.user.role} />} />;
}

export function JobRoute() {
  return (
    <WithMe
      render={(me, id) => (
        <JobPage
          id={id}
          canEdit={canManageSales(me.user.role)}
          canOpenBuilder={(SECTION_ROLES.builders as readonly string[]).includes(me.user.role)}
          canListJobs={(SECTION_ROLES.jobs as readonly string[]).includes(me.user.role)}
          orders={(job) => <JobOrders job={job} canEdit={canManageSales(me.user.role)} />}
        />
      )}
    />
  );
}

export function OrdersRoute() {
  return <WithMe render={(me) => <OrdersPage role={me.user.role} />} />;
}

export function OrderRoute() {
  return (
    <WithMe
      render={(me, id) => (
        <OrderPage
          id={id}
          canEdit={canManageSales(me.user.role)}
          canOpenJob={(SECTION_ROLES.job as readonly string[]).includes(me.user.role)}
          canSeeQuotes={(SECTION_ROLES.quotes as readonly string[]).includes(me.user.role)}
          canSeeShop={(SECTION_ROLES.shop as readonly string[]).includes(me.user.role)}
          markHref={markLinkFor(me.user.role)}
          payments={
            canManageSales(me.user.role)
              ? (order) => (
                  <>
                    <RecordAcceptanceCard order={order} />
                    <DeskPayments order={order} />
                  </>
                )
              : undefined
          }
          production={(order) => (
            <OrderProductionCard
              order={order}
              canPromise={canManageSales(me.user.role)}
              canHoldRelease={me.user.role === 'admin'}
              canSignOff={me.user.role === 'admin' || me.user.role === 'foreman'}
            />
          )}
        />
      )}
    />
  );
}
