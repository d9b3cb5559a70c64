import type { QueryClient } from '@tanstack/react-query';
import { useLoaderData, useParams, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import type { Role } from '../../../shared/api/roles';
import { requireRole } from '../../app/guards';
import { Alert, PageHeader } from '../../components/ui';
import { canManageSales } from '../../lib/permissions';
import { orderQueryOptions } from './api/get-order';
import { quoteQueryOptions } from './api/get-quote';
import { quotesQueryOptions } from './api/list-quotes';
import { positiveIntParam } from './quote-path';
import { lazyPage } from '../../app/lazy-page';

const QuotesPage = lazyPage(() => import('./components/QuotesPage').then((m) => m.QuotesPage));
const QuotePage = lazyPage(() => import('./components/QuotePage').then((m) => m.QuotePage));

/** Who opens quotes: staff who make and send them, and builders (the server scopes them). */
export const QUOTE_ROLES = ['admin', 'sales', 'builder'] as const satisfies readonly Role[];

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

/** What the pages need from their loader: whether the signed-in user makes and sends quotes. */
interface QuoteRouteData {
  canManage: boolean;
}

function NoSuchQuote() {
  return (
    <>
      <PageHeader title="Quote not found" />
      <Alert tone="warning">This address names no order or quote. Open it from the order.</Alert>
    </>
  );
}

function QuotesRoute() {
  const { canManage } = useLoaderData<QuoteRouteData>();
  const orderId = positiveIntParam(useParams().orderId);
  if (orderId === undefined) return <NoSuchQuote />;
  return <QuotesPage key={orderId} orderId={orderId} canCreate={canManage} />;
}

function QuoteRoute() {
  const { canManage } = useLoaderData<QuoteRouteData>();
  const params = useParams();
  const orderId = positiveIntParam(params.orderId);
  const number = positiveIntParam(params.number);
  if (orderId === undefined || number === undefined) return <NoSuchQuote />;
  return (
    <QuotePage key={`${orderId}/${number}`} orderId={orderId} number={number} canSend={canManage} />
  );
}

/**
 * Routes of quotes, relative to the signed-in frame: an order's revisions
 * (`/orders/:orderId/quotes`) and one revision (`/orders/:orderId/quotes/:number`). Loaders check
 * the role and prefetch; failures are left to the page, which shows them with a retry.
 */
export function quoteRoutes(queryClient: QueryClient): RouteObject[] {
  const guard = async (request: Request): Promise<QuoteRouteData> => {
    const me = await requireRole(queryClient, request, QUOTE_ROLES);
    return { canManage: canManageSales(me.user.role) };
  };
  return [
    {
      path: 'orders/:orderId/quotes',
      loader: async ({ request, params }: LoaderFunctionArgs) => {
        const data = await guard(request);
        const orderId = positiveIntParam(params.orderId);
        if (orderId !== undefined) {
          await settleWithin(
            Promise.all([
              queryClient.ensureQueryData(orderQueryOptions(orderId)),
              queryClient.ensureQueryData(quotesQueryOptions(orderId)),
            ]),
          );
        }
        return data;
      },
      element: <QuotesRoute />,
    },
    {
      path: 'orders/:orderId/quotes/:number',
      loader: async ({ request, params }: LoaderFunctionArgs) => {
        const data = await guard(request);
        const orderId = positiveIntParam(params.orderId);
        const number = positiveIntParam(params.number);
        if (orderId !== undefined && number !== undefined) {
          await settleWithin(
            Promise.all([
              queryClient.ensureQueryData(quoteQueryOptions(orderId, number)),
              queryClient.ensureQueryData(orderQueryOptions(orderId)),
            ]),
          );
        }
        return data;
      },
      element: <QuoteRoute />,
    },
  ];
}
