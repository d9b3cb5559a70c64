import type { OrderStatus, ReviewState } from '../../../shared/api/orders';
import type { BadgeTone } from '../../components/ui';

export { ORDER_STATUS_LABELS, orderStatusLabel } from '../../../shared/api/orderStatus';

/** Badge colour per order state: grey while open, blue while committed, green when done. */
export const ORDER_STATUS_TONES: Record<OrderStatus, BadgeTone> = {
  draft: 'neutral',
  quoted: 'brand',
  accepted: 'info',
  deposit_paid: 'info',
  released: 'info',
  in_production: 'warning',
  ready: 'success',
  delivered: 'success',
  cancelled: 'danger',
};

/** Plain names of a truss line's review state. */
export const REVIEW_STATE_LABELS: Record<ReviewState, string> = {
  pending: 'Waiting for review',
  approved: 'Approved',
  returned: 'Sent back',
};

/** Badge colour per review state. */
export const REVIEW_STATE_TONES: Record<ReviewState, BadgeTone> = {
  pending: 'warning',
  approved: 'success',
  returned: 'danger',
};

/** Badge tone of a status string from the API ('neutral' for one this client does not know). */
export function orderStatusTone(status: string): BadgeTone {
  return status in ORDER_STATUS_TONES ? ORDER_STATUS_TONES[status as OrderStatus] : 'neutral';
}
