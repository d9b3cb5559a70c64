import { describe, expect, it } from 'vitest';
import { areaLoadUnit, formatAreaLoad, optionalNumberFromInput } from '../../../src/lib/units';

describe('area load units at the edge', () => {
  it('labels loads psf for imperial plants and kPa for metric (shared/api/jobs.ts)', () => {
    expect(areaLoadUnit('imperial')).toBe('psf');
    expect(areaLoadUnit('metric')).toBe('kPa');
  });

  it('formats typical loads: 20 psf = 0.96 kPa (1 psf = 47.88 Pa, NIST SP 811 (2008) Appendix B.8, from memory)', () => {
    expect(formatAreaLoad(20, 'imperial')).toBe('20 psf');
    expect(formatAreaLoad(12.5, 'imperial')).toBe('12.5 psf');
    expect(formatAreaLoad(0.9576, 'metric')).toBe('0.96 kPa');
    expect(formatAreaLoad(0, 'metric')).toBe('0 kPa');
  });

  it('shows a dash when there is no value', () => {
    expect(formatAreaLoad(null, 'imperial')).toBe('—');
    expect(formatAreaLoad(undefined, 'metric')).toBe('—');
    expect(formatAreaLoad(Number.NaN, 'metric')).toBe('—');
  });
});

describe('optional numbers from form inputs', () => {
  it('maps empty input to the caller’s "not given"', () => {
    expect(optionalNumberFromInput('', null)).toBeNull();
    expect(optionalNumberFromInput('  ', undefined)).toBeUndefined();
    expect(optionalNumberFromInput(undefined, null)).toBeNull();
  });

  it('reads numbers and keeps junk as NaN so the schema reports it', () => {
    expect(optionalNumberFromInput('25', null)).toBe(25);
    expect(optionalNumberFromInput(' 1.2 ', undefined)).toBe(1.2);
    expect(optionalNumberFromInput(30, null)).toBe(30);
    expect(optionalNumberFromInput('abc', null)).toBeNaN();
  });
});
