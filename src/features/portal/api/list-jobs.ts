import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JobSummary } from '../../../../shared/api/list';
import type { OrderSummary } from '../../../../shared/api/orders';
import type { PageOf } from '../../../components/ui';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

// The API's largest page: more jobs than this in one company is beyond a portal home page.
const ALL = { page: 1, pageSize: 100, sort: '-createdAt' };

/**
 * `GET /api/jobs` and `GET /api/orders` (both scoped to the builder's company by the server):
 * every job of theirs with its orders, newest first.
 */
export const portalJobsQueryOptions = () =>
  queryOptions({
    queryKey: [...portalKeys.all, 'jobs'] as const,
    queryFn: async ({ signal }) => {
      // Typed, not parsed: this answer is on a builder's first load, which carries no zod (README,
      // "Portal bundle"); tests/server parse it with the shared schema.
      const [jobs, orders] = await Promise.all([
        api.request<PageOf<JobSummary>>('/api/jobs', { query: ALL, signal }),
        api.request<PageOf<OrderSummary>>('/api/orders', { query: ALL, signal }),
      ]);
      return jobs.items.map((job) => ({
        ...job,
        orders: orders.items.filter((o) => o.job.id === job.id),
      }));
    },
  });

/** The builder's jobs, each with its orders. */
export const usePortalJobs = () => useQuery(portalJobsQueryOptions());
