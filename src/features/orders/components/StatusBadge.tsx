import type { ReviewState } from '../../../../shared/api/orders';
import { Badge } from '../../../components/ui';
import {
  REVIEW_STATE_LABELS,
  REVIEW_STATE_TONES,
  orderStatusLabel,
  orderStatusTone,
} from '../order-status';

/** An order's state as a coloured badge. */
export function OrderStatusBadge({ status }: { status: string }) {
  return <Badge tone={orderStatusTone(status)}>{orderStatusLabel(status)}</Badge>;
}

/** A truss line's review state as a coloured badge. */
export function ReviewBadge({ state }: { state: ReviewState }) {
  return <Badge tone={REVIEW_STATE_TONES[state]}>{REVIEW_STATE_LABELS[state]}</Badge>;
}
