import { describe, expect, it } from 'vitest';
import {
  GRADE_DATA,
  designValues,
  lumberIds,
  referenceValuesPsi,
} from '../../../../shared/engine/lumber';

describe('reference values (NDS 2018 Supplement, engineering.md §1)', () => {
  it('Table 4A rows as published', () => {
    expect(referenceValuesPsi('SPF-1/2', '2x4')).toEqual({
      fb: 875,
      ft: 450,
      fv: 135,
      fcPerp: 425,
      fc: 1150,
      e: 1_400_000,
      emin: 510_000,
    });
    expect(referenceValuesPsi('DFL-1', '2x6').fc).toBe(1500);
    expect(referenceValuesPsi('DFL-2', '2x6').emin).toBe(580_000);
    expect(referenceValuesPsi('HF-2', '2x4').fb).toBe(850);
  });

  it('Table 4B Southern Pine is size-specific (2x4 vs 2x6)', () => {
    expect(referenceValuesPsi('SP-1', '2x4').fb).toBe(1500);
    expect(referenceValuesPsi('SP-1', '2x6').fb).toBe(1350);
    expect(referenceValuesPsi('SP-2', '2x4').fc).toBe(1450);
    expect(referenceValuesPsi('SP-2', '2x6').ft).toBe(600);
  });

  it('Table 4C MSR (msrlumber.org)', () => {
    expect(referenceValuesPsi('MSR-1650-1.5E', '2x4')).toMatchObject({
      fb: 1650,
      ft: 1020,
      fc: 1700,
    });
    expect(referenceValuesPsi('MSR-2100-1.8E', '2x6')).toMatchObject({
      fb: 2100,
      ft: 1575,
      fc: 1875,
    });
  });

  it('every id has positive values and a cited table', () => {
    for (const id of lumberIds()) {
      const d = designValues(id, { cd: 1, repetitive: false });
      for (const k of ['fb', 'ft', 'fv', 'fcStar', 'fcPerp', 'e', 'emin'] as const) {
        expect(d[k]).toBeGreaterThan(0);
      }
    }
    for (const g of Object.values(GRADE_DATA))
      expect(g.table).toMatch(/^NDS 2018 Supplement Table 4[ABC]$/);
  });
});
