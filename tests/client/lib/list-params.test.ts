import { describe, expect, it } from 'vitest';
import {
  DEFAULT_PAGE_SIZE,
  filterFromSearch,
  idFilterFromSearch,
  listParamsFromSearch,
  mergeListSearch,
  pageCount,
  searchFromListParams,
} from '../../../src/lib/list-params';

describe('list params in the URL', () => {
  it('reads defaults from an empty URL', () => {
    expect(listParamsFromSearch(new URLSearchParams())).toEqual({
      q: '',
      page: 1,
      pageSize: DEFAULT_PAGE_SIZE,
    });
  });

  it('tolerates junk and caps the page size at the API maximum of 100 (shared/api/list.ts)', () => {
    const params = listParamsFromSearch(
      new URLSearchParams('page=-3&pageSize=5000&sort=drop;table'),
    );
    expect(params).toEqual({ q: '', page: 1, pageSize: 100 });
  });

  it('round-trips and leaves defaults out of the URL', () => {
    const search = searchFromListParams({
      q: 'oak',
      page: 3,
      pageSize: DEFAULT_PAGE_SIZE,
      sort: '-createdAt',
    });
    expect(search.toString()).toBe('q=oak&page=3&sort=-createdAt');
    expect(listParamsFromSearch(search)).toEqual({
      q: 'oak',
      page: 3,
      pageSize: DEFAULT_PAGE_SIZE,
      sort: '-createdAt',
    });
    expect(searchFromListParams({ q: '', page: 1 }).toString()).toBe('');
  });

  it('counts pages, at least one', () => {
    expect(pageCount(0, 25)).toBe(1);
    expect(pageCount(25, 25)).toBe(1);
    expect(pageCount(26, 25)).toBe(2);
  });
});

const merge = (search: string, change: Parameters<typeof mergeListSearch>[1]) =>
  mergeListSearch(new URLSearchParams(search), change).toString();

describe('list filters in the URL', () => {
  it('keeps filters when paging, searching or sorting', () => {
    expect(merge('terms=account&page=2', { page: 3 })).toBe('page=3&terms=account');
    expect(merge('status=draft&customerId=4', { q: 'lot 7', page: 1 })).toBe(
      'q=lot+7&status=draft&customerId=4',
    );
    expect(merge('terms=deposit', { sort: '-city' })).toBe('sort=-city&terms=deposit');
  });

  it('sets and clears a filter, going back to page 1', () => {
    expect(merge('page=4&q=oak', { filters: { terms: 'account' } })).toBe('q=oak&terms=account');
    expect(merge('terms=account&sort=name', { filters: { terms: '' } })).toBe('sort=name');
    expect(merge('status=draft', { filters: { status: undefined } })).toBe('');
  });

  it('reads only allowed filter values', () => {
    const search = new URLSearchParams('terms=account&status=bogus');
    expect(filterFromSearch(search, 'terms', ['account', 'deposit'])).toBe('account');
    expect(filterFromSearch(search, 'status', ['draft', 'quoted'])).toBeUndefined();
    expect(filterFromSearch(search, 'missing', ['a'])).toBeUndefined();
  });

  it('reads positive whole-number ids, ignoring junk', () => {
    const id = (text: string) => idFilterFromSearch(new URLSearchParams(text), 'customerId');
    expect(id('customerId=12')).toBe(12);
    expect(id('customerId=0')).toBeUndefined();
    expect(id('customerId=-3')).toBeUndefined();
    expect(id('customerId=2.5')).toBeUndefined();
    expect(id('customerId=abc')).toBeUndefined();
    expect(id('')).toBeUndefined();
  });
});
