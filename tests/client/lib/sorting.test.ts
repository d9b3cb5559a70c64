import { describe, expect, it } from 'vitest';
import { sortingFromParam, sortParamFromSorting } from '../../../src/lib/sorting';

// The list endpoints take one `sort` key, `-` for descending (shared/api/list.ts listQuerySchema).
describe('sort parameter and table sorting state', () => {
  it('reads ascending and descending keys', () => {
    expect(sortingFromParam('name')).toEqual([{ id: 'name', desc: false }]);
    expect(sortingFromParam('-createdAt')).toEqual([{ id: 'createdAt', desc: true }]);
  });

  it('treats a missing or bare "-" sort as unsorted', () => {
    expect(sortingFromParam(undefined)).toEqual([]);
    expect(sortingFromParam('-')).toEqual([]);
  });

  it('writes state back, using only the first column', () => {
    expect(sortParamFromSorting([{ id: 'city', desc: true }])).toBe('-city');
    expect(
      sortParamFromSorting([
        { id: 'terms', desc: false },
        { id: 'name', desc: true },
      ]),
    ).toBe('terms');
    expect(sortParamFromSorting([])).toBeUndefined();
  });

  it('round-trips', () => {
    for (const sort of ['name', '-name', 'updatedAt', '-number']) {
      expect(sortParamFromSorting(sortingFromParam(sort))).toBe(sort);
    }
  });
});
