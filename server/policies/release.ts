import type { OrderStatus, ReviewState } from '../../shared/api/orders';

/** What the release gate looks at: the order's status and hold, its lines' reviews, the terms. */
export interface ReleaseFacts {
  status: OrderStatus;
  onHold: boolean;
  reviewStates: readonly ReviewState[];
  terms: 'account' | 'deposit';
}

/** Orders the builder has accepted and that are not yet released. */
const AWAITING_RELEASE: readonly OrderStatus[] = ['accepted', 'deposit_paid'];

/**
 * THE release rule (DESIGN.md §2): an accepted order goes to production when every line's design
 * is approved and the deposit is paid (status `deposit_paid`) or the builder is on account terms,
 * unless the plant manager holds it. Returns why not, or an empty list when it may be released.
 * `ignorePayment` is the plant manager's manual release: it overrides the deposit, never the review.
 */
export function releaseBlockers(f: ReleaseFacts, opts: { ignorePayment?: boolean } = {}): string[] {
  const why: string[] = [];
  if (!AWAITING_RELEASE.includes(f.status))
    why.push(`The order is ${f.status.replace('_', ' ')}, not accepted.`);
  if (f.onHold && !opts.ignorePayment) why.push('The order is on hold.');
  if (f.reviewStates.length === 0) why.push('The order has no truss lines.');
  else if (f.reviewStates.some((s) => s !== 'approved'))
    why.push('Every truss design must be approved first.');
  if (!opts.ignorePayment && f.status !== 'deposit_paid' && f.terms !== 'account')
    why.push('The deposit is not paid and the builder is not on account terms.');
  return why;
}

/** May this order be released now, by itself? */
export const mayRelease = (f: ReleaseFacts) => releaseBlockers(f).length === 0;
