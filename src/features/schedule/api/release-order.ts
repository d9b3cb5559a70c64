import type { HoldInput } from '../../../../shared/api/production';
import { postOrderAction, useOrderAction } from './order-action';

/** `POST /api/orders/:id/release` (plant manager): release by hand, or lift a hold. */
export const releaseOrder = (orderId: number, body: HoldInput) =>
  postOrderAction(orderId, 'release', body);

export const useReleaseOrder = (orderId: number) => useOrderAction(orderId, releaseOrder);
