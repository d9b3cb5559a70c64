import { describe, expect, it } from 'vitest';
import { queryKeys } from '../../../src/lib/query-keys';

/** TanStack Query matches keys by prefix (common practice: invalidate `all` to refresh a resource). */
const startsWith = (key: readonly unknown[], prefix: readonly unknown[]) =>
  prefix.every((part, i) => JSON.stringify(key[i]) === JSON.stringify(part));

describe('query key factories', () => {
  it('nest lists and details under the resource', () => {
    const { users } = queryKeys;
    expect(users.all).toEqual(['users']);
    expect(users.list({ q: 'ann', page: 2 })).toEqual(['users', 'list', { q: 'ann', page: 2 }]);
    expect(users.detail(7)).toEqual(['users', 'detail', 7]);
    expect(startsWith(users.list({ page: 3 }), users.lists())).toBe(true);
    expect(startsWith(users.detail(7), users.all)).toBe(true);
  });

  it('keep resources apart', () => {
    expect(startsWith(queryKeys.jobs.list(), queryKeys.customers.all)).toBe(false);
    expect(queryKeys.customers.list({})[0]).toBe('customers');
    expect(queryKeys.plant.summary()).toEqual(['plant', 'summary']);
    expect(startsWith(queryKeys.auth.me(), queryKeys.auth.all)).toBe(true);
  });
});
