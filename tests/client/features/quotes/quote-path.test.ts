import { describe, expect, it } from 'vitest';
import { quoteKeys } from '../../../../src/features/quotes/api/keys';
import { quotePdfPath } from '../../../../src/features/quotes/api/quote-pdf';
import {
  positiveIntParam,
  quotePath,
  quotesPath,
} from '../../../../src/features/quotes/quote-path';

describe('quote addresses', () => {
  it('nests a revision under its order', () => {
    expect(quotesPath(7)).toBe('/orders/7/quotes');
    expect(quotePath(7, 2)).toBe('/orders/7/quotes/2');
    expect(quotePdfPath(7, 2)).toBe('/api/orders/7/quotes/2/pdf');
  });

  it('accepts only positive whole numbers from the address', () => {
    expect(positiveIntParam('12')).toBe(12);
    for (const junk of [undefined, '', '0', '-1', '1.5', '1e3', 'abc', '99999999999999999999']) {
      expect(positiveIntParam(junk)).toBeUndefined();
    }
  });
});

describe('quote query keys', () => {
  it('share prefixes, so invalidating a list or all details reaches each query below it', () => {
    const list = quoteKeys.list(7);
    const detail = quoteKeys.detail(7, 2);
    expect(list.slice(0, quoteKeys.lists().length)).toEqual(quoteKeys.lists());
    expect(detail.slice(0, quoteKeys.details().length)).toEqual(quoteKeys.details());
    expect(detail[0]).toBe(quoteKeys.all[0]);
    expect(quoteKeys.list(8)).not.toEqual(list);
  });
});
