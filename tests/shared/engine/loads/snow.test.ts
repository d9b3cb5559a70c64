import { describe, expect, it } from 'vitest';
import {
  EXPOSURE_FACTOR,
  SNOW_IMPORTANCE_FACTOR,
  THERMAL_FACTOR,
  flatRoofSnowLoad,
  slopeFactor,
  slopedRoofSnowLoad,
} from '../../../../shared/engine/loads';
import { kpaToPsf, psf, psfToKpa } from '../../../../shared/engine/units';

const pg30 = psfToKpa(psf(30));
const sixTwelve = (Math.atan(6 / 12) * 180) / Math.PI; // 26.57°

describe('flat-roof snow, ASCE 7-16 Eq. 7.3-1 (engineering.md §3 check values, C)', () => {
  it('pg = 30 psf, Ce = Ct = Is = 1.0 → pf = 21.0 psf', () => {
    expect(kpaToPsf(flatRoofSnowLoad({ pg: pg30, ce: 1, ct: 1, is: 1 }))).toBeWithin(21, {
      rel: 1e-12,
    });
  });

  it('Is multiplies in 7-16 and is dropped in 7-22', () => {
    const is = SNOW_IMPORTANCE_FACTOR.IV;
    expect(kpaToPsf(flatRoofSnowLoad({ pg: pg30, ce: 1, ct: 1, is }))).toBeWithin(25.2);
    expect(kpaToPsf(flatRoofSnowLoad({ pg: pg30, ce: 1, ct: 1, is, edition: '7-22' }))).toBeWithin(
      21,
    );
  });

  it('Ce, Ct and Is tables (ASCE 7-16 Tables 7.3-1, 7.3-2, 1.5-2)', () => {
    expect(EXPOSURE_FACTOR.B).toEqual({ fullyExposed: 0.9, partiallyExposed: 1.0, sheltered: 1.2 });
    expect(THERMAL_FACTOR).toEqual({
      heated: 1.0,
      justAboveFreezing: 1.1,
      unheatedOrOpen: 1.2,
      keptBelowFreezing: 1.3,
      heatedGreenhouse: 0.85,
    });
    expect(SNOW_IMPORTANCE_FACTOR).toEqual({ I: 0.8, II: 1.0, III: 1.1, IV: 1.2 });
    const pf = flatRoofSnowLoad({
      pg: pg30,
      ce: EXPOSURE_FACTOR.B.sheltered,
      ct: THERMAL_FACTOR.unheatedOrOpen,
    });
    expect(kpaToPsf(pf)).toBeWithin(0.7 * 1.2 * 1.2 * 30);
  });

  it('refuses negative inputs', () => {
    expect(() => flatRoofSnowLoad({ pg: psfToKpa(psf(-1)), ce: 1, ct: 1 })).toThrow(/pg/);
  });
});

describe('slope factor Cs, ASCE 7-16 Fig. 7.4-1 (engineering.md §3, V2)', () => {
  it('6:12 warm, other surfaces → 1.0, ps = 21.0 psf', () => {
    expect(slopeFactor({ slopeDeg: sixTwelve, ct: 1, slippery: false })).toBe(1);
    const ps = slopedRoofSnowLoad({
      pg: pg30,
      ce: 1,
      ct: 1,
      is: 1,
      slopeDeg: sixTwelve,
      slippery: false,
    });
    expect(kpaToPsf(ps)).toBeWithin(21);
  });

  it('6:12 warm, slippery → Cs = 0.668, ps = 14.0 psf', () => {
    expect(slopeFactor({ slopeDeg: sixTwelve, ct: 1, slippery: true })).toBeWithin(0.668, {
      abs: 5e-4,
    });
    const ps = slopedRoofSnowLoad({
      pg: pg30,
      ce: 1,
      ct: 1,
      is: 1,
      slopeDeg: sixTwelve,
      slippery: true,
    });
    expect(kpaToPsf(ps)).toBeWithin(14.0, { abs: 0.05 });
  });

  it('warm, other: Cs = 1 − (θ − 30)/40; breakpoints 30 / 37.5 / 45° and 5 / 10 / 15°', () => {
    expect(slopeFactor({ slopeDeg: 45, ct: 1, slippery: false })).toBeWithin(1 - 15 / 40);
    expect(slopeFactor({ slopeDeg: 37.5, ct: 1.1, slippery: false })).toBe(1);
    expect(slopeFactor({ slopeDeg: 45, ct: 1.2, slippery: false })).toBe(1);
    expect(slopeFactor({ slopeDeg: 10, ct: 1.1, slippery: true })).toBe(1);
    // eng-tips qid=165815 quoting commentary C7.4-2(a): Cs = 1 − (θ − 10°)/60° for Ct = 1.1 slippery.
    expect(slopeFactor({ slopeDeg: 40, ct: 1.1, slippery: true })).toBeWithin(1 - 30 / 60);
    expect(slopeFactor({ slopeDeg: 15, ct: 1.2, slippery: true })).toBe(1);
    expect(slopeFactor({ slopeDeg: 70, ct: 1, slippery: false })).toBe(0);
    expect(slopeFactor({ slopeDeg: 80, ct: 1.2, slippery: true })).toBe(0);
  });
});
