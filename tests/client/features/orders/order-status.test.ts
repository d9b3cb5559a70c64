import { describe, expect, it } from 'vitest';
import { ORDER_STATUSES, REVIEW_STATES } from '../../../../shared/api/orders';
import {
  ORDER_STATUS_LABELS,
  REVIEW_STATE_LABELS,
  orderStatusLabel,
  orderStatusTone,
} from '../../../../src/features/orders/order-status';

describe('order and review state names (DESIGN.md §2 flow; names our own)', () => {
  it('names every order state of the contract', () => {
    expect(Object.keys(ORDER_STATUS_LABELS).sort()).toEqual([...ORDER_STATUSES].sort());
    expect(orderStatusLabel('deposit_paid')).toBe('Deposit paid');
    expect(orderStatusLabel('in_production')).toBe('In production');
  });

  it('names the review states as the sales desk says them', () => {
    expect(Object.keys(REVIEW_STATE_LABELS).sort()).toEqual([...REVIEW_STATES].sort());
    expect(REVIEW_STATE_LABELS).toEqual({
      pending: 'Waiting for review',
      approved: 'Approved',
      returned: 'Sent back',
    });
  });

  it('tolerates a state this client does not know yet', () => {
    expect(orderStatusLabel('on_hold')).toBe('on hold');
    expect(orderStatusTone('on_hold')).toBe('neutral');
  });
});
