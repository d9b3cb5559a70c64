import { describe, expect, it } from 'vitest';
import { orderIdFromSearch, reviewPath } from '../../../../src/features/reviews/review-link';

describe('review page links', () => {
  it('carries the order id in the query and reads it back', () => {
    const path = reviewPath(11, 7);
    expect(path).toBe('/reviews/11?order=7');
    expect(orderIdFromSearch(new URL(path, 'http://x').searchParams)).toBe(7);
  });

  it('ignores a missing or malformed order id', () => {
    expect(orderIdFromSearch(new URLSearchParams())).toBeUndefined();
    expect(orderIdFromSearch(new URLSearchParams('order=abc'))).toBeUndefined();
    expect(orderIdFromSearch(new URLSearchParams('order=-2'))).toBeUndefined();
    expect(orderIdFromSearch(new URLSearchParams('order=1.5'))).toBeUndefined();
  });
});
