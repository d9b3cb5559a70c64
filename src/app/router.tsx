import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type LoaderFunctionArgs } from 'react-router';
import { BuildersPage } from '../features/builders/components/BuildersPage';
import { customersQueryOptions } from '../features/builders/api/list-customers';
import { useMe } from '../features/auth/api/me';
import { SignInPage } from '../features/auth/components/SignInPage';
import { healthQueryOptions } from '../features/auth/api/health';
import {
  buildersQueryOptions,
  recentJobsQueryOptions,
  usersOverviewQueryOptions,
} from '../features/dashboard/api/dashboard-queries';
import { DashboardPage } from '../features/dashboard/components/DashboardPage';
import { jobsQueryOptions } from '../features/jobs/api/list-jobs';
import { JobsPage } from '../features/jobs/components/JobsPage';
import { usersQueryOptions } from '../features/users/api/list-users';
import { UsersPage } from '../features/users/components/UsersPage';
import { Spinner } from '../components/ui';
import { listParamsFromSearch } from '../lib/list-params';
import { AppFrame } from './AppFrame';
import { ErrorPage, NotFoundPage } from './ErrorPages';
import { redirectIfSignedIn, requireRole, requireSession } from './guards';
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

function StartupSpinner() {
  return (
    <div className="flex min-h-screen items-center justify-center">
      <Spinner label="Loading Spanwise…" />
    </div>
  );
}

const paramsOf = (request: Request) => listParamsFromSearch(new URL(request.url).searchParams);

function HomeRoute() {
  const me = useMe().data;
  return me ? <DashboardPage me={me} /> : null;
}

/** The route table: public sign-in, then the guarded frame with one section per role. */
export function createAppRouter(queryClient: QueryClient) {
  const section =
    (
      roles: readonly Parameters<typeof requireRole>[2][number][],
      load: (args: LoaderFunctionArgs) => Promise<unknown>,
    ) =>
    async (args: LoaderFunctionArgs) => {
      await requireRole(queryClient, args.request, roles);
      return load(args);
    };

  return createBrowserRouter([
    {
      path: '/sign-in',
      loader: async () => {
        void queryClient.prefetchQuery(healthQueryOptions());
        return redirectIfSignedIn(queryClient);
      },
      element: <SignInPage />,
      hydrateFallbackElement: <StartupSpinner />,
      errorElement: <ErrorPage />,
    },
    {
      path: '/',
      id: 'frame',
      loader: ({ request }) => requireSession(queryClient, request),
      element: <AppFrame />,
      hydrateFallbackElement: <StartupSpinner />,
      errorElement: <ErrorPage />,
      children: [
        {
          errorElement: <ErrorPage />,
          children: [
            {
              index: true,
              loader: async ({ request }) => {
                const me = await requireSession(queryClient, request);
                const jobs = queryClient.ensureQueryData(recentJobsQueryOptions());
                const extra =
                  me.user.role === 'admin'
                    ? [
                        queryClient.ensureQueryData(usersOverviewQueryOptions()),
                        queryClient.ensureQueryData(buildersQueryOptions()),
                      ]
                    : me.user.role === 'sales'
                      ? [queryClient.ensureQueryData(buildersQueryOptions())]
                      : [];
                return prefetch(Promise.all([jobs, ...extra]));
              },
              element: <HomeRoute />,
            },
            {
              path: 'users',
              loader: section(SECTION_ROLES.users, ({ request }) =>
                prefetch(queryClient.ensureQueryData(usersQueryOptions(paramsOf(request)))),
              ),
              element: <UsersPage />,
            },
            {
              path: 'builders',
              loader: section(SECTION_ROLES.builders, ({ request }) =>
                prefetch(queryClient.ensureQueryData(customersQueryOptions(paramsOf(request)))),
              ),
              element: <BuildersPage />,
            },
            {
              path: 'jobs',
              loader: section(SECTION_ROLES.jobs, ({ request }) =>
                prefetch(queryClient.ensureQueryData(jobsQueryOptions(paramsOf(request)))),
              ),
              element: <JobsPage />,
            },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ]);
}
