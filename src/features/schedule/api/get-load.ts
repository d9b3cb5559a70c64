import { queryOptions, useQuery } from '@tanstack/react-query';
import { scheduleSchema } from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';
import { scheduleKeys } from './keys';

/** Only what the load chart reads: the rest of the answer is dropped unchecked. */
const loadSchema = scheduleSchema.pick({ from: true, days: true, load: true });

/** `GET /api/schedule?from&days` read for the load chart: each table-day's used and capacity. */
export const scheduleLoadQueryOptions = (from: string | undefined, days: number) =>
  queryOptions({
    queryKey: scheduleKeys.load(from, days),
    queryFn: ({ signal }) =>
      api.request('/api/schedule', { query: { from, days }, schema: loadSchema, signal }),
  });

/** The planned load of the coming weeks, for the chart. */
export function useScheduleLoad(from: string | undefined, days: number) {
  return useQuery(scheduleLoadQueryOptions(from, days));
}
