import type { DeliveryInput } from '../../../../shared/api/production';
import { postOrderAction, useOrderAction } from './order-action';

/** `POST /api/orders/:id/delivery` (foreman, plant manager): who received it, when, a note. */
export const signOffDelivery = (orderId: number, body: DeliveryInput) =>
  postOrderAction(orderId, 'delivery', body);

export const useSignOffDelivery = (orderId: number) => useOrderAction(orderId, signOffDelivery);
