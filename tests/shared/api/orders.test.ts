import { describe, expect, it } from 'vitest';
import { ORDER_STATUSES, linesMayChange } from '../../../shared/api/orders';

describe('which orders take changes to their truss lines (one rule for the server and the page)', () => {
  it('only a draft or a quoted order (a change to a quoted one makes a new revision)', () => {
    const open = ORDER_STATUSES.filter((status) => linesMayChange(status));
    expect(open).toEqual(['draft', 'quoted']);
  });
});
