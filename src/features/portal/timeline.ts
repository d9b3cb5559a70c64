import type { OrderDetail } from '../../../shared/api/orders';

/** The order's steps as the builder follows them, in order. */
export const TIMELINE = [
  ['accepted', 'Accepted'],
  ['deposit_paid', 'Deposit paid'],
  ['released', 'Released to production'],
  ['in_production', 'In production'],
  ['ready', 'Ready'],
  ['delivered', 'Delivered'],
] as const;

const EVENT_STEP: Record<string, string> = {
  'quote.accepted': 'accepted',
  'payment.received': 'deposit_paid',
};

/**
 * Each step with the date it was reached (from the builder's history), or null while ahead. A
 * step the order passed without a dated event (account terms skip the deposit) has no date.
 */
export function timelineOf(order: OrderDetail) {
  const at = new Map<string, string>();
  for (const h of [...order.history].reverse()) {
    const step =
      EVENT_STEP[h.action] ?? (h.action === 'order.status' ? h.summary.split(' ').pop() : null);
    if (step && !at.has(step)) at.set(step, h.at);
  }
  const reached = TIMELINE.findIndex(([s]) => s === order.status);
  return TIMELINE.map(([status, label], i) => ({
    status,
    label,
    done: reached >= i,
    at: at.get(status) ?? null,
  }));
}
