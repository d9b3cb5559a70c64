import { queryOptions, useQuery } from '@tanstack/react-query';
import { scheduleSchema } from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';
import { scheduleKeys } from './keys';

/** `GET /api/schedule?from&days` query options. */
export const scheduleQueryOptions = (from: string | undefined, days: number) =>
  queryOptions({
    queryKey: scheduleKeys.board(from, days),
    queryFn: ({ signal }) =>
      api.request('/api/schedule', { query: { from, days }, schema: scheduleSchema, signal }),
  });

/** The board: tables × working days with load, blocks and the scheduled orders. */
export function useSchedule(from: string | undefined, days: number) {
  return useQuery(scheduleQueryOptions(from, days));
}
