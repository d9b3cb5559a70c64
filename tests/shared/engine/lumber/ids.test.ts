import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../../../shared/engine/errors';
import {
  LUMBER_GRADES,
  LUMBER_SIZES,
  isLumberId,
  lumberIds,
  lumberLabel,
  parseLumberId,
} from '../../../../shared/engine/lumber';

describe('lumber ids', () => {
  it('lists every size × grade combination once', () => {
    const ids = lumberIds();
    expect(ids).toHaveLength(LUMBER_SIZES.length * LUMBER_GRADES.length);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toContain('2x4 SPF-1/2');
    expect(ids).toContain('2x12 MSR-2100-1.8E');
  });

  it('parses and labels ids', () => {
    expect(parseLumberId('2x6 DFL-2')).toEqual({ size: '2x6', grade: 'DFL-2' });
    expect(lumberLabel('2x4 SPF-1/2')).toBe('2x4 SPF No.1/No.2');
    expect(lumberLabel('2x8 HF-1')).toBe('2x8 Hem-Fir No.1');
    expect(lumberLabel('2x4 MSR-1650-1.5E')).toBe('2x4 MSR 1650f-1.5E');
  });

  it.each(['2x5 SPF-1/2', '2x4 SPF-2', '2x4', '', '2x4 SP-1 extra'])(
    'refuses "%s" with an invalid EngineError',
    (bad) => {
      expect(isLumberId(bad)).toBe(false);
      try {
        parseLumberId(bad);
        expect.unreachable();
      } catch (e) {
        expect(isEngineError(e) && e.code).toBe('invalid');
      }
    },
  );
});
