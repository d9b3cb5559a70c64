import type { HoldInput } from '../../../../shared/api/production';
import { postOrderAction, useOrderAction } from './order-action';

/** `POST /api/orders/:id/hold` (plant manager): off the schedule, no automatic release. */
export const holdOrder = (orderId: number, body: HoldInput) =>
  postOrderAction(orderId, 'hold', body);

export const useHoldOrder = (orderId: number) => useOrderAction(orderId, holdOrder);
