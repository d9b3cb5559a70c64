import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { jobQueryOptions } from './api/get-job';
import { lineQueryOptions } from './api/get-line';
import { orderQueryOptions } from './api/get-order';
import { plantQueryOptions } from './api/get-plant';

/** Who may open the truss editor: the sales desk and the plant manager. */
export const TRUSS_EDITOR_ROLES = ['admin', 'sales'] as const satisfies readonly Role[];

/** The editor (and the engine it runs in the browser) loads only when someone opens it. */
const editor = async () => ({
  Component: (await import('./components/TrussEditorPage')).TrussEditorPage,
});

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

/**
 * Routes of the truss editor, relative to the signed-in frame. Loaders check the role and
 * prefetch the order, its job, the plant and (when editing) the stored line; failures are left
 * to the page, which shows them with a retry.
 */
export function trussEditorRoutes(queryClient: QueryClient): RouteObject[] {
  const load = async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, TRUSS_EDITOR_ROLES);
    const orderId = Number(params.orderId);
    const lineId = params.lineId === undefined ? undefined : Number(params.lineId);
    if (!Number.isInteger(orderId) || orderId <= 0) return null;
    const work = (async () => {
      const order = queryClient.ensureQueryData(orderQueryOptions(orderId));
      const rest = [
        queryClient.ensureQueryData(plantQueryOptions()),
        ...(lineId !== undefined && Number.isInteger(lineId) && lineId > 0
          ? [queryClient.ensureQueryData(lineQueryOptions(orderId, lineId))]
          : []),
      ];
      // Prefetches whose result nobody awaits must not surface as unhandled rejections.
      for (const p of rest) p.catch(() => null);
      const { job } = await order;
      await Promise.all([queryClient.ensureQueryData(jobQueryOptions(job.id)), ...rest]);
    })();
    return settleWithin(work);
  };
  return [
    { path: 'orders/:orderId/lines/new', loader: load, lazy: editor },
    { path: 'orders/:orderId/lines/:lineId', loader: load, lazy: editor },
  ];
}
