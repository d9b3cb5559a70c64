import type { PromisedDateInput } from '../../../../shared/api/production';
import { postOrderAction, useOrderAction } from './order-action';

/** `POST /api/orders/:id/promised-date` (sales, admin): set the date, or change it with a reason. */
export const setPromisedDate = (orderId: number, body: PromisedDateInput) =>
  postOrderAction(orderId, 'promised-date', body);

export const useSetPromisedDate = (orderId: number) => useOrderAction(orderId, setPromisedDate);
