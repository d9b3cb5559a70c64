import { describe, expect, it } from 'vitest';
import { spliceRun } from '../../../../shared/engine/profiles/pieces';

// Splice rule (common practice, as the brief states it): cut at the interior panel point nearest
// the middle that keeps both parts within the stock length.
describe('spliceRun', () => {
  const names = ['M1', 'M2', 'M3', 'M4', 'M5'];

  it('leaves a run that fits alone', () => {
    expect(spliceRun([2000, 2000, 2000], 6096, names)).toEqual([]);
    expect(spliceRun([3048, 3048], 6096, names)).toEqual([]);
  });

  it('cuts at the panel point nearest the middle that fits both parts', () => {
    // 7000 total, middle 3500: panel points at 1000, 3000, 5000 → 3000 is nearest and fits.
    expect(spliceRun([1000, 2000, 2000, 2000], 6096, names)).toEqual([2]);
  });

  it('cuts again when no single cut fits both parts', () => {
    // 10 000 total: points at 4500 and 5500 split it 4500 | 5500, which fits 6096 stock; with
    // 5000 stock neither does, so it cuts at 4500 (tie, left) and again at 5500.
    expect(spliceRun([4500, 1000, 4500], 6096, names)).toEqual([1]);
    expect(spliceRun([4500, 1000, 4500], 5000, names)).toEqual([1, 2]);
  });

  it('breaks ties to the left', () => {
    expect(spliceRun([3000, 3000, 3000], 6096, names)).toEqual([1]);
  });

  it('refuses a member longer than the stock', () => {
    expect(() => spliceRun([1000, 7000], 6096, names)).toThrow(/M2/);
  });
});
