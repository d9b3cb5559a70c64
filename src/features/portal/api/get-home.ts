import { queryOptions, useQuery } from '@tanstack/react-query';
import { portalHomeSchema } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `GET /api/portal/home`: quotes to answer, deposits due, orders in progress, messages. */
export const portalHomeQueryOptions = () =>
  queryOptions({
    queryKey: portalKeys.home(),
    queryFn: ({ signal }) => api.request('/api/portal/home', { schema: portalHomeSchema, signal }),
  });

export const usePortalHome = () => useQuery(portalHomeQueryOptions());
