import { describe, expect, it } from 'vitest';
import {
  DEFAULT_PAGE_SIZE,
  listParamsFromSearch,
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
