import { describe, expect, it } from 'vitest';
import {
  LOAD_CASES,
  flatRoofSnowLoad,
  loadCombinations,
  slopeFactor,
  type LoadCaseId,
} from '../../../../shared/engine/loads';
import { velocityPressure, windCases, type WindSite } from '../../../../shared/engine/loads/wind';
import { kpa, mm } from '../../../../shared/engine/units';
import { engineErrorOf } from '../analysis/support/errors';

// Refusals carry the stable code 'invalid' and the offending input, which the API passes on.
describe('load refusals and limits', () => {
  it('snow: a negative pg is refused, pg = 0 (no snow) is not', () => {
    const e = engineErrorOf(() => flatRoofSnowLoad({ pg: kpa(-1), ce: 1, ct: 1 }));
    expect([e.code, e.message, e.details]).toEqual([
      'invalid',
      'Snow load: pg must be a number ≥ 0.',
      { pg: -1 },
    ]);
    expect(flatRoofSnowLoad({ pg: kpa(0), ce: 1, ct: 1 })).toBe(0);
  });

  it('Cs: the slope must be 0°–90° (ASCE 7-16 Fig. 7.4-1 ends at 70°: Cs = 0 beyond)', () => {
    for (const slopeDeg of [-1, 91, Number.NaN]) {
      const e = engineErrorOf(() => slopeFactor({ slopeDeg, ct: 1, slippery: false }));
      expect([e.code, e.message]).toEqual(['invalid', 'Roof slope must be between 0° and 90°.']);
      expect(e.details).toEqual({ slopeDeg });
    }
    expect(slopeFactor({ slopeDeg: 0, ct: 1, slippery: false })).toBe(1);
    expect(slopeFactor({ slopeDeg: 90, ct: 1, slippery: false })).toBe(0);
  });

  it('combinations: an unknown case names the known ones', () => {
    const e = engineErrorOf(() => loadCombinations(['X' as LoadCaseId]));
    expect([e.code, e.details]).toEqual(['invalid', { loadCase: 'X', known: [...LOAD_CASES] }]);
  });

  it('wind: each bad site value is named, several are joined, the site comes back', () => {
    const site: WindSite = { speed: 50, exposure: 'C', meanRoofHeight: mm(4000) };
    const bad: [Partial<WindSite>, string][] = [
      [{ meanRoofHeight: mm(0) }, 'mean roof height must be positive'],
      [{ exposure: 'X' as WindSite['exposure'] }, 'exposure must be B, C or D'],
    ];
    for (const [change, text] of bad) {
      const e = engineErrorOf(() => velocityPressure({ ...site, ...change }));
      expect([e.code, e.message, e.details]).toEqual([
        'invalid',
        `Wind: ${text}.`,
        { ...site, ...change },
      ]);
    }
    const both = engineErrorOf(() => velocityPressure({ ...site, speed: 0, kzt: 0.9 }));
    expect(both.message).toBe('Wind: wind speed must be positive; Kzt must be at least 1.0.');
  });
});

describe('wind case labels', () => {
  it('name the load case, the direction and the sign of GCpi', () => {
    expect(windCases(kpa(1), 5).map((c) => c.label)).toEqual([
      'A, from left, +GCpi',
      'A, from left, −GCpi',
      'A, from right, +GCpi',
      'A, from right, −GCpi',
      'B, from left, +GCpi',
      'B, from left, −GCpi',
      'B, from right, +GCpi',
      'B, from right, −GCpi',
    ]);
  });
});
