import { describe, expect, it } from 'vitest';
import { formatDate } from '../../../src/lib/format';

describe('formatDate', () => {
  it('prints a calendar date as that day, whatever the reader’s time zone', () => {
    // A delivery day is a day, not an instant: 9 Dec stays 9 Dec west of Greenwich too.
    expect(formatDate('2026-12-09')).toBe('9 Dec 2026');
    expect(formatDate('2027-01-01')).toBe('1 Jan 2027');
  });
  it('prints a timestamp as a short date and a dash when there is none', () => {
    expect(formatDate('2026-12-09T15:00:00Z')).toMatch(/^(9|10) Dec 2026$/);
    expect(formatDate(null)).toBe('—');
    expect(formatDate('not a date')).toBe('—');
  });
});
