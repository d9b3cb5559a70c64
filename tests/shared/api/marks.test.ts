import { describe, expect, it } from 'vitest';
import { nextFreeMark } from '../../../shared/api/marks';

describe('nextFreeMark', () => {
  it('is T1 for an order without lines', () => {
    expect(nextFreeMark([])).toBe('T1');
  });

  it('is one past the highest T-number, whatever else the order holds', () => {
    expect(nextFreeMark(['T1', 'T4', 'G1', 't7x'])).toBe('T5');
    expect(nextFreeMark(['t9'])).toBe('T10'); // any case counts
    expect(nextFreeMark(['G1', 'HIP-A', 'T'])).toBe('T1'); // no T-number at all
  });

  it('does not fill gaps left by deleted lines', () => {
    expect(nextFreeMark(['T1', 'T3'])).toBe('T4');
  });

  it('reads numbers past the double digits and with leading zeros', () => {
    expect(nextFreeMark(['T099', 'T100'])).toBe('T101');
  });
});
