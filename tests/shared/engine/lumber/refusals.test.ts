import { describe, expect, it } from 'vitest';
import {
  LUMBER_GRADES,
  LUMBER_SIZES,
  REPETITIVE_MAX_SPACING_MM,
  bearingAreaFactor,
  designValues,
  isLumberId,
  parseLumberId,
  repetitiveApplies,
  sizeFactors,
} from '../../../../shared/engine/lumber';
import { engineErrorOf } from '../analysis/support/errors';

// Refusals carry the stable code 'invalid' and the offending input, which the API passes on.
describe('lumber refusals', () => {
  it('CD outside (0, 2], a width with no size factor, a bearing length of 0', () => {
    const cd = engineErrorOf(() => designValues('2x4 SPF-1/2', { cd: 0, repetitive: false }));
    expect([cd.code, cd.details]).toEqual(['invalid', { cd: 0 }]);
    const cf = engineErrorOf(() => sizeFactors('table4A', 7));
    expect([cf.code, cf.details]).toEqual(['invalid', { nominalWidth: 7 }]);
    const cb = engineErrorOf(() => bearingAreaFactor(0, 0));
    expect([cb.code, cb.details]).toEqual(['invalid', { bearingLength: 0 }]);
  });

  it('an unknown lumber id lists the sizes and grades there are', () => {
    const e = engineErrorOf(() => parseLumberId('2x5 SPF-1/2'));
    expect(e.code).toBe('invalid');
    expect(e.message).toBe(
      'Unknown lumber "2x5 SPF-1/2": expected "<size> <grade>", e.g. "2x4 SPF-1/2".',
    );
    expect(e.details).toEqual({
      lumberId: '2x5 SPF-1/2',
      sizes: [...LUMBER_SIZES],
      grades: [...LUMBER_GRADES],
    });
    expect(LUMBER_SIZES.length).toBeGreaterThan(0);
    expect(LUMBER_GRADES.length).toBeGreaterThan(0);
  });
});

describe('lumber ids as typed by a person', () => {
  it('surrounding and repeated spaces are ignored', () => {
    expect(parseLumberId(' 2x4 SPF-1/2 ')).toEqual({ size: '2x4', grade: 'SPF-1/2' });
    expect(parseLumberId('2x6   DFL-2')).toEqual({ size: '2x6', grade: 'DFL-2' });
    expect(isLumberId('2x4 SPF-1/2')).toBe(true);
    expect(isLumberId('2x4')).toBe(false);
  });
});

describe('Cr spacing limit (NDS 2018 4.3.9: not more than 24 in. o.c.)', () => {
  it('keeps half a millimetre of slack for 24 in. entered as rounded millimetres', () => {
    expect(repetitiveApplies(REPETITIVE_MAX_SPACING_MM + 0.5)).toBe(true);
    expect(repetitiveApplies(REPETITIVE_MAX_SPACING_MM + 0.6)).toBe(false);
  });
});
