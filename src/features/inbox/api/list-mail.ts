import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { mailMessageSchema } from '../../../../shared/api/pricing';
import { api } from '../../../lib/api-client';
import { mailKeys } from './keys';

const mailListSchema = z.object({ items: z.array(mailMessageSchema) });

/** `GET /api/dev/mail` (admin, demo mode): every message the local mail fake holds; 404 without it. */
export const mailQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.list(),
    queryFn: ({ signal }) => api.request('/api/dev/mail', { schema: mailListSchema, signal }),
    // New mail arrives while the page is open (a quote was just sent): look again now and then.
    staleTime: 0,
  });

/** The demo inbox. */
export function useMail() {
  return useQuery(mailQueryOptions());
}
