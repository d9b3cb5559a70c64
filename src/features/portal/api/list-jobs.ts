import { queryOptions, useQuery } from '@tanstack/react-query';
import { jobSummarySchema, pageOf } from '../../../../shared/api/list';
import { orderSummarySchema } from '../../../../shared/api/orders';
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
      const [jobs, orders] = await Promise.all([
        api.request('/api/jobs', { query: ALL, schema: pageOf(jobSummarySchema), signal }),
        api.request('/api/orders', { query: ALL, schema: pageOf(orderSummarySchema), signal }),
      ]);
      return jobs.items.map((job) => ({
        ...job,
        orders: orders.items.filter((o) => o.job.id === job.id),
      }));
    },
  });

/** The builder's jobs, each with its orders. */
export const usePortalJobs = () => useQuery(portalJobsQueryOptions());
