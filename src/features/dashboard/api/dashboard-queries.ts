import { useQuery } from '@tanstack/react-query';
import { customerSummarySchema, jobSummarySchema, pageOf } from '../../../../shared/api/list';
import { userSchema } from '../../../../shared/api/users';
import { pagedListQueryOptions } from '../../../lib/paged-list';
import { customerKeys, jobKeys, userKeys, type ListParams } from '../../../lib/query-keys';

/** Newest jobs first; the landing pages show a short list. */
export const RECENT_JOBS: ListParams = { page: 1, pageSize: 8, sort: '-createdAt' };
/** Builder companies by name, enough for a landing-page table. */
export const TOP_BUILDERS: ListParams = { page: 1, pageSize: 10, sort: 'name' };
/** One page of users large enough to count roles at a typical plant (API max is 100). */
export const ALL_USERS: ListParams = { page: 1, pageSize: 100 };

/** Query options of the landing pages' recent jobs. */
export const recentJobsQueryOptions = () =>
  pagedListQueryOptions({
    queryKey: jobKeys.list(RECENT_JOBS),
    path: '/api/jobs',
    schema: pageOf(jobSummarySchema),
    params: RECENT_JOBS,
  });

/** Query options of the landing pages' builder companies. */
export const buildersQueryOptions = () =>
  pagedListQueryOptions({
    queryKey: customerKeys.list(TOP_BUILDERS),
    path: '/api/customers',
    schema: pageOf(customerSummarySchema),
    params: TOP_BUILDERS,
  });

/** Query options of the admin overview's users. */
export const usersOverviewQueryOptions = () =>
  pagedListQueryOptions({
    queryKey: userKeys.list(ALL_USERS),
    path: '/api/users',
    schema: pageOf(userSchema),
    params: ALL_USERS,
  });

/** Recent jobs (server-scoped to the builder's company for builders). */
export const useRecentJobs = () => useQuery(recentJobsQueryOptions());
/** Builder companies (staff). */
export const useBuilders = () => useQuery(buildersQueryOptions());
/** Users of the plant (admin). */
export const useUsersOverview = () => useQuery(usersOverviewQueryOptions());
