import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PortalHome } from '../../../../shared/api/portal';
import { api } from '../../../lib/api-client';
import { portalKeys } from './keys';

/** `GET /api/portal/home`: quotes to answer, deposits due, orders in progress, messages. */
export const portalHomeQueryOptions = () =>
  queryOptions({
    queryKey: portalKeys.home(),
    // Typed, not parsed: this answer is on a builder's first load, which carries no zod (README,
    // "Portal bundle"); tests/server parse it with the shared schema.
    queryFn: ({ signal }) => api.request<PortalHome>('/api/portal/home', { signal }),
  });

export const usePortalHome = () => useQuery(portalHomeQueryOptions());
