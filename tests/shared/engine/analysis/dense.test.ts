import { describe, expect, it } from 'vitest';
import {
  choleskyFactor,
  choleskySolve,
  luFactor,
  luSolve,
} from '../../../../shared/engine/analysis/dense';

describe('dense kernels', () => {
  it('LU with pivoting solves a system whose first pivot is zero', () => {
    // [[0, 2, 1], [1, 1, 0], [3, 0, 1]] · [1, 2, 3] = [7, 3, 6] (hand arithmetic).
    const f = luFactor(Float64Array.from([0, 2, 1, 1, 1, 0, 3, 0, 1]), 3);
    const x = new Float64Array(3);
    luSolve(f, [7, 3, 6], x);
    expect(Array.from(x)).toEqual([1, 2, 3].map((v) => expect.closeTo(v, 12)));
    expect(f.minPivot).toBeGreaterThan(0);
  });

  it('LU reports an exactly singular matrix', () => {
    expect(luFactor(Float64Array.from([1, 2, 2, 4]), 2).minPivot).toBe(0);
  });

  it('Cholesky solves an SPD system and flags an indefinite one', () => {
    // [[4, 2], [2, 3]] · [1, −1] = [2, −1].
    const f = choleskyFactor(Float64Array.from([4, 2, 2, 3]), 2);
    const x = new Float64Array(2);
    choleskySolve(f, [2, -1], x);
    expect(Array.from(x)).toEqual([expect.closeTo(1, 12), expect.closeTo(-1, 12)]);
    expect(choleskyFactor(Float64Array.from([1, 2, 2, 1]), 2).minPivotRatio).toBeLessThanOrEqual(0);
  });
});
