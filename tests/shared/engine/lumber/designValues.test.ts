import { describe, expect, it } from 'vitest';
import {
  GRADE_DATA,
  LOAD_DURATION_FACTOR,
  bearingAreaFactor,
  designValues,
  lumberIds,
  nominalBoardFeetPerFoot,
  referenceValuesPsi,
  relativeCostPerFoot,
  sizeFactors,
} from '../../../../shared/engine/lumber';
import { mpaToPsi, type MPa } from '../../../../shared/engine/units';

const psiOf = (v: MPa) => mpaToPsi(v);

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

describe('adjustment factors', () => {
  it('CD per NDS 2018 Table 2.3.2', () => {
    expect(LOAD_DURATION_FACTOR).toMatchObject({
      permanent: 0.9,
      tenYears: 1.0,
      twoMonths: 1.15,
      sevenDays: 1.25,
      tenMinutes: 1.6,
      impact: 2.0,
    });
  });

  it('CF per NDS 2018 Supplement Table 4A adjustment factors', () => {
    expect(sizeFactors('table4A', 4)).toEqual({ fb: 1.5, ft: 1.5, fc: 1.15 });
    expect(sizeFactors('table4A', 6)).toEqual({ fb: 1.3, ft: 1.3, fc: 1.1 });
    expect(sizeFactors('table4A', 8)).toEqual({ fb: 1.2, ft: 1.2, fc: 1.05 });
    expect(sizeFactors('table4A', 12)).toEqual({ fb: 1.0, ft: 1.0, fc: 1.0 });
    expect(sizeFactors('none', 4)).toEqual({ fb: 1, ft: 1, fc: 1 });
  });

  it('Cb per NDS 2018 3.10.4: (lb + 0.375)/lb, 1.0 at ends or lb ≥ 6 in', () => {
    expect(bearingAreaFactor(1.5 * 25.4, 10 * 25.4)).toBeWithin(1.25, { rel: 1e-12 });
    expect(bearingAreaFactor(3.5 * 25.4, 10 * 25.4)).toBeWithin(3.875 / 3.5, { rel: 1e-12 });
    expect(bearingAreaFactor(3.5 * 25.4, 0)).toBe(1);
    expect(bearingAreaFactor(6 * 25.4, 10 * 25.4)).toBe(1);
  });
});

describe('designValues', () => {
  it('SPF No.1/No.2 2x4, snow: Ft′ = 450×1.15×1.5 = 776.25 psi (engineering.md §2, truss-style check)', () => {
    const d = designValues('2x4 SPF-1/2', { cd: 1.15, repetitive: true });
    expect(psiOf(d.ft)).toBeWithin(776.25, { rel: 1e-9 });
    // Fb′ = 875 × 1.15 × 1.5 × 1.15 (Cr) — NDS 2018 Table 4.3.1.
    expect(psiOf(d.fb)).toBeWithin(875 * 1.15 * 1.5 * 1.15, { rel: 1e-9 });
    expect(psiOf(d.fcStar)).toBeWithin(1150 * 1.15 * 1.15, { rel: 1e-9 });
    // CD does not apply to Fc⊥, E or Emin (NDS 2018 Table 4.3.1).
    expect(psiOf(d.fcPerp)).toBeWithin(425, { rel: 1e-9 });
    expect(psiOf(d.emin)).toBeWithin(510_000, { rel: 1e-9 });
  });

  it('DF-L No.1 2x6 (MST 5260 Problem 7.32): Fc* = 1,485 (D) … 2,640 (W); Fb′ = 2,392 (W, Cr)', () => {
    const fc = (cd: number) => psiOf(designValues('2x6 DFL-1', { cd, repetitive: false }).fcStar);
    expect(fc(0.9)).toBeWithin(1485, { rel: 1e-9 });
    expect(fc(1.0)).toBeWithin(1650, { rel: 1e-9 });
    expect(fc(1.25)).toBeWithin(2062.5, { rel: 1e-9 });
    expect(fc(1.6)).toBeWithin(2640, { rel: 1e-9 });
    expect(psiOf(designValues('2x6 DFL-1', { cd: 1.6, repetitive: true }).fb)).toBeWithin(2392, {
      rel: 1e-9,
    });
  });

  it('Southern Pine and MSR take CF = 1.0', () => {
    expect(psiOf(designValues('2x6 SP-2', { cd: 1, repetitive: false }).fb)).toBeWithin(1000);
    expect(psiOf(designValues('2x4 MSR-1650-1.5E', { cd: 1, repetitive: false }).ft)).toBeWithin(
      1020,
    );
  });

  it('refuses a CD outside (0, 2]', () => {
    expect(() => designValues('2x4 SPF-1/2', { cd: 0, repetitive: false })).toThrow(/CD/);
  });
});

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
