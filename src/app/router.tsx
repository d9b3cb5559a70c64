import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import type { Me } from '../../shared/api/auth';
import { customerQueryOptions } from '../features/builders/api/customer';
import {
  customerListParamsFromSearch,
  customersQueryOptions,
} from '../features/builders/api/list-customers';
import {
  buildersQueryOptions,
  recentJobsQueryOptions,
  usersOverviewQueryOptions,
} from '../features/dashboard/api/dashboard-queries';
import { jobQueryOptions, plantQueryOptions } from '../features/jobs/api/job';
import { jobListParamsFromSearch, jobsQueryOptions } from '../features/jobs/api/list-jobs';
import { orderListParamsFromSearch, ordersQueryOptions } from '../features/orders/api/list-orders';
import { orderQueryOptions } from '../features/orders/api/order';
import { reviewRoutes } from '../features/reviews/routes';
import { trussEditorRoutes } from '../features/truss-editor/routes';
import { planFileRoutes } from '../features/plan-files/routes';
import { priceBookRoutes } from '../features/price-book/routes';
import { stockSettingsRoutes } from '../features/stock-settings/routes';
import { lumberPlanRoutes } from '../features/lumber-plan/routes';
import { quoteRoutes } from '../features/quotes/routes';
import { inboxRoutes } from '../features/inbox/routes';
import { shopRoutes } from '../features/shop/routes';
import { shopPaperRoutes } from '../features/shop-paper/routes';
import { scheduleRoutes } from '../features/schedule/routes';
import { floorRoutes } from '../features/floor/routes';
import { productionSettingsRoutes } from '../features/production-settings/routes';
import { designRulesRoutes } from '../features/design-rules/routes';
import { usersQueryOptions } from '../features/users/api/list-users';
import { listParamsFromSearch } from '../lib/list-params';
import { requireRole } from './guards';
import { SECTION_ROLES } from './navigation';

/** How long a loader waits for its data before showing the page with its own loading state. */
const PREFETCH_WAIT_MS = 800;

/**
 * Starts a prefetch and waits for it briefly, so fast pages render complete; slow or failing
 * data (retries take seconds) is left to the page's own spinner and error message.
 */
const prefetch = (promise: Promise<unknown>) =>
  Promise.race([
    promise.then(
      () => null,
      () => null,
    ),
    new Promise<null>((resolve) => setTimeout(() => resolve(null), PREFETCH_WAIT_MS)),
  ]);

const searchOf = (request: Request) => new URL(request.url).searchParams;
const paramsOf = (request: Request) => listParamsFromSearch(searchOf(request));

/** The numeric `:id` of a detail route; junk answers 404 instead of a failed request. */
function idParam(value: string | undefined): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such record.', { status: 404 });
  return id;
}

/** A desk page, loaded when first opened (the sign-in page and the portal never load them). */
const desk = (name: keyof typeof import('./desk-pages')) => async () => ({
  Component: (await import('./desk-pages'))[name],
});

/** What the desk's home loads before it shows (a builder's home is the portal). */
export function homeLoader(queryClient: QueryClient, role: Me['user']['role']) {
  const jobs = queryClient.ensureQueryData(recentJobsQueryOptions());
  const extra =
    role === 'admin'
      ? [
          queryClient.ensureQueryData(usersOverviewQueryOptions()),
          queryClient.ensureQueryData(buildersQueryOptions()),
        ]
      : role === 'sales'
        ? [queryClient.ensureQueryData(buildersQueryOptions())]
        : [];
  return prefetch(Promise.all([jobs, ...extra]));
}

/**
 * The staff's routes (and the features' own), children of the signed-in frame. Loaded only when a
 * path outside the portal is first opened (`entry-router.tsx` patches them in), so the sign-in
 * page and the builder's portal never download these loaders or their schemas.
 */
export function deskRoutes(queryClient: QueryClient): RouteObject[] {
  const section =
    (
      roles: readonly Parameters<typeof requireRole>[2][number][],
      load: (args: LoaderFunctionArgs) => Promise<unknown>,
    ) =>
    async (args: LoaderFunctionArgs) => {
      await requireRole(queryClient, args.request, roles);
      return load(args);
    };

  return [
    {
      path: 'users',
      loader: section(SECTION_ROLES.users, ({ request }) =>
        prefetch(queryClient.ensureQueryData(usersQueryOptions(paramsOf(request)))),
      ),
      lazy: desk('UsersRoute'),
    },
    {
      path: 'builders',
      loader: section(SECTION_ROLES.builders, ({ request }) =>
        prefetch(
          queryClient.ensureQueryData(
            customersQueryOptions(customerListParamsFromSearch(searchOf(request))),
          ),
        ),
      ),
      lazy: desk('BuildersRoute'),
    },
    {
      path: 'builders/:id',
      loader: section(SECTION_ROLES.builders, ({ params }) =>
        prefetch(
          Promise.all([
            queryClient.ensureQueryData(customerQueryOptions(idParam(params.id))),
            queryClient.ensureQueryData(plantQueryOptions()),
          ]),
        ),
      ),
      lazy: desk('BuilderRoute'),
    },
    {
      path: 'jobs',
      loader: section(SECTION_ROLES.jobs, ({ request }) =>
        prefetch(
          queryClient.ensureQueryData(jobsQueryOptions(jobListParamsFromSearch(searchOf(request)))),
        ),
      ),
      lazy: desk('JobsRoute'),
    },
    {
      path: 'jobs/:id',
      loader: section(SECTION_ROLES.job, ({ params }) =>
        prefetch(
          Promise.all([
            queryClient.ensureQueryData(jobQueryOptions(idParam(params.id))),
            queryClient.ensureQueryData(plantQueryOptions()),
          ]),
        ),
      ),
      lazy: desk('JobRoute'),
    },
    {
      path: 'orders',
      loader: section(SECTION_ROLES.orders, ({ request }) =>
        prefetch(
          queryClient.ensureQueryData(
            ordersQueryOptions(orderListParamsFromSearch(searchOf(request))),
          ),
        ),
      ),
      lazy: desk('OrdersRoute'),
    },
    {
      path: 'orders/:id',
      loader: section(SECTION_ROLES.orders, ({ params }) =>
        prefetch(queryClient.ensureQueryData(orderQueryOptions(idParam(params.id)))),
      ),
      lazy: desk('OrderRoute'),
    },
    ...trussEditorRoutes(queryClient),
    ...reviewRoutes(queryClient),
    ...planFileRoutes(queryClient),
    ...priceBookRoutes(queryClient),
    ...quoteRoutes(queryClient),
    ...inboxRoutes(queryClient),
    ...stockSettingsRoutes(queryClient),
    ...lumberPlanRoutes(queryClient),
    ...shopRoutes(queryClient),
    ...shopPaperRoutes(queryClient),
    ...scheduleRoutes(queryClient),
    ...floorRoutes(queryClient),
    ...productionSettingsRoutes(queryClient),
    ...designRulesRoutes(queryClient),
  ];
}
