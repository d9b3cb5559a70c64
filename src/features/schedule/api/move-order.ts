import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { moveSchema } from '../../../../shared/api/production';
import { api } from '../../../lib/api-client';
import { scheduleKeys } from './keys';

const moveResultSchema = z.object({
  orderId: z.number(),
  late: z.boolean(),
  plannedFinishOn: z.string().nullable(),
  promisedOn: z.string().nullable(),
});
export type MoveResult = z.infer<typeof moveResultSchema>;

/** `POST /api/schedule/moves` (foreman, plant manager): the order starts on this table and day. */
export function moveOrder(body: z.infer<typeof moveSchema>): Promise<MoveResult> {
  return api.request('/api/schedule/moves', { method: 'POST', body, schema: moveResultSchema });
}

export function useMoveOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveOrder,
    onSettled: () => queryClient.invalidateQueries({ queryKey: scheduleKeys.all }),
  });
}
