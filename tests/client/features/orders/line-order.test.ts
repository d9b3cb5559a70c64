import { describe, expect, it } from 'vitest';
import { designStateText, movedLineIds } from '../../../../src/features/orders/line-order';

// Lines as the server lists them; positions need not match array order.
const lines = [
  { id: 11, position: 2 },
  { id: 10, position: 1 },
  { id: 12, position: 3 },
];

describe('moving a truss line (POST …/lines/reorder takes every line id, shared/api/orders.ts)', () => {
  it('moves a line up or down by one place, sending every id', () => {
    expect(movedLineIds(lines, 11, -1)).toEqual([11, 10, 12]);
    expect(movedLineIds(lines, 11, 1)).toEqual([10, 12, 11]);
  });

  it('refuses moves past either end and unknown ids', () => {
    expect(movedLineIds(lines, 10, -1)).toBeNull();
    expect(movedLineIds(lines, 12, 1)).toBeNull();
    expect(movedLineIds(lines, 99, 1)).toBeNull();
    expect(movedLineIds([], 1, 1)).toBeNull();
  });

  it('does not change the caller’s array', () => {
    const copy = structuredClone(lines);
    movedLineIds(lines, 12, -1);
    expect(lines).toEqual(copy);
  });
});

describe('design state text', () => {
  it('says passes or fails, warnings and the largest CSI (demand / capacity)', () => {
    expect(designStateText({ designOk: true, maxCsi: 0.874, warningCount: 0 })).toBe(
      'Passes · max CSI 0.87',
    );
    expect(designStateText({ designOk: false, maxCsi: 1.12, warningCount: 2 })).toBe(
      'Fails · 2 warnings · max CSI 1.12',
    );
    expect(designStateText({ designOk: true, maxCsi: null, warningCount: 1 })).toBe(
      'Passes · 1 warning',
    );
  });
});
