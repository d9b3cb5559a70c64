import { describe, expect, it } from 'vitest';
import { inspectionsDue, weekStart } from '../../../../shared/engine/schedule';

describe('inspection cadence (ANSI/TPI 1-2014 §3.3.2: three per set-up location per shift per week)', () => {
  it('owes three per shift, less what is done', () => {
    const due = inspectionsDue(
      [
        { id: 1, shifts: 1 },
        { id: 2, shifts: 2 },
      ],
      new Map([[2, 4]]),
    );
    expect(due).toEqual([
      { tableId: 1, required: 3, done: 0, due: 3 },
      { tableId: 2, required: 6, done: 4, due: 2 },
    ]);
  });

  it('counts weeks from Monday', () => {
    expect(weekStart('2027-01-04')).toBe('2027-01-04'); // a Monday
    expect(weekStart('2027-01-10')).toBe('2027-01-04'); // the Sunday after
    expect(weekStart('2027-01-11')).toBe('2027-01-11');
  });
});
