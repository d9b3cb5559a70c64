import { queryOptions, useQuery } from '@tanstack/react-query';
import { floorDaySchema } from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';
import { floorKeys } from './keys';

/** `GET /api/floor/today` query options: each table's work planned for the day. */
export const floorDayQueryOptions = (date?: string) =>
  queryOptions({
    queryKey: floorKeys.day(date),
    queryFn: ({ signal }) =>
      api.request('/api/floor/today', { query: { date }, schema: floorDaySchema, signal }),
  });

export function useFloorDay(date?: string) {
  return useQuery(floorDayQueryOptions(date));
}
