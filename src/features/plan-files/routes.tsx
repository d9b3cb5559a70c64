import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { planJobQueryOptions } from './api/get-job';
import { planFilesQueryOptions } from './api/list-plan-files';
import { lazyPage } from '../../app/lazy-page';

const PlanFilesPage = lazyPage(() =>
  import('./components/PlanFilesPage').then((m) => m.PlanFilesPage),
);

/** Who opens a job's plans: every role that sees the job (the server scopes builders). */
export const PLAN_FILE_ROLES = [
  'admin',
  'sales',
  'engineer',
  'foreman',
  'builder',
] as const satisfies readonly Role[];

/** Who uploads plans (the server enforces the same; builders only on their company's jobs). */
export const PLAN_UPLOAD_ROLES: readonly Role[] = ['admin', 'sales', 'builder'];

/** How long a loader waits for data before the page shows its own spinner. */
const PREFETCH_WAIT_MS = 800;

const settleWithin = (promise: Promise<unknown>) =>
  Promise.race([
    promise.then(
      () => null,
      () => null,
    ),
    new Promise<null>((resolve) => setTimeout(() => resolve(null), PREFETCH_WAIT_MS)),
  ]);

/** What the page needs from its loader. */
interface PlanFilesRouteData {
  jobId: number;
  canUpload: boolean;
}

function PlanFilesRoute() {
  const { jobId, canUpload } = useLoaderData<PlanFilesRouteData>();
  return <PlanFilesPage key={jobId} jobId={jobId} canUpload={canUpload} />;
}

/** Routes of a job's plan files, relative to the signed-in frame: `/jobs/:jobId/files`. */
export function planFileRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: 'jobs/:jobId/files',
      loader: async ({ request, params }: LoaderFunctionArgs): Promise<PlanFilesRouteData> => {
        const me = await requireRole(queryClient, request, PLAN_FILE_ROLES);
        const jobId = Number(params.jobId);
        if (!Number.isInteger(jobId) || jobId <= 0)
          throw new Response('No such job.', { status: 404 });
        await settleWithin(
          Promise.all([
            queryClient.ensureQueryData(planJobQueryOptions(jobId)),
            queryClient.ensureQueryData(planFilesQueryOptions(jobId)),
          ]),
        );
        return { jobId, canUpload: PLAN_UPLOAD_ROLES.includes(me.user.role) };
      },
      element: <PlanFilesRoute />,
    },
  ];
}
