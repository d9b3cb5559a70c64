import type { OrderStatus } from './orders';

/** Plain names of an order's states (DESIGN.md §2), as the plant's staff say them. */
export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  draft: 'Draft',
  quoted: 'Quoted',
  accepted: 'Accepted',
  deposit_paid: 'Deposit paid',
  released: 'Released',
  in_production: 'In production',
  ready: 'Ready',
  delivered: 'Delivered',
  cancelled: 'Cancelled',
};

/** The same states as a builder reads them: the plant's quote was sent to them, not "quoted". */
export const BUILDER_STATUS_LABELS: Record<OrderStatus, string> = {
  ...ORDER_STATUS_LABELS,
  draft: 'Being prepared',
  quoted: 'Quote sent',
};

/** Label of a status string from the API, tolerating one this client does not know yet. */
export function orderStatusLabel(status: string, reader: 'staff' | 'builder' = 'staff'): string {
  const labels = reader === 'builder' ? BUILDER_STATUS_LABELS : ORDER_STATUS_LABELS;
  return status in labels ? labels[status as OrderStatus] : status.replace(/_/g, ' ');
}
