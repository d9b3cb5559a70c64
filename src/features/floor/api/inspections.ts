import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { InspectionInput } from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';
import { floorKeys } from './keys';

export const inspectionLogSchema = z.object({
  weekOf: z.string(),
  stations: z.array(
    z.object({
      tableId: z.number(),
      name: z.string(),
      required: z.number(),
      done: z.number(),
      due: z.number(),
    }),
  ),
  records: z.array(
    z.object({
      id: z.number(),
      at: z.string(),
      station: z.string(),
      truss: z.string(),
      checks: z.record(z.string(), z.boolean()),
      passed: z.boolean(),
      notes: z.string().nullable(),
      inspector: z.string().nullable(),
    }),
  ),
});
export type InspectionLog = z.infer<typeof inspectionLogSchema>;

/** `GET /api/floor/inspections`: stations due this week and the latest records. */
export const inspectionLogQueryOptions = () =>
  queryOptions({
    queryKey: [...floorKeys.all, 'inspections'] as const,
    queryFn: ({ signal }) =>
      api.request('/api/floor/inspections', { schema: inspectionLogSchema, signal }),
  });

export const useInspectionLog = () => useQuery(inspectionLogQueryOptions());

/** `POST /api/floor/inspections` → the log as it now stands. */
export function useRecordInspection() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InspectionInput) =>
      api.request('/api/floor/inspections', { method: 'POST', body, schema: inspectionLogSchema }),
    onSuccess: (log) => queryClient.setQueryData(inspectionLogQueryOptions().queryKey, log),
  });
}
