import { describe, expect, it } from 'vitest';
import { nominalBoardFeetPerFoot, relativeCostPerFoot } from '../../../../shared/engine/lumber';

describe('relative cost (common practice)', () => {
  it('board feet per foot from nominal size', () => {
    expect(nominalBoardFeetPerFoot('2x4 SPF-1/2')).toBeWithin(8 / 12);
    expect(nominalBoardFeetPerFoot('2x12 SP-2')).toBeWithin(2);
  });

  it('a bigger size or a better grade costs more', () => {
    expect(relativeCostPerFoot('2x6 SPF-1/2')).toBeGreaterThan(relativeCostPerFoot('2x4 SPF-1/2'));
    expect(relativeCostPerFoot('2x4 MSR-2100-1.8E')).toBeGreaterThan(
      relativeCostPerFoot('2x4 SPF-1/2'),
    );
  });
});
