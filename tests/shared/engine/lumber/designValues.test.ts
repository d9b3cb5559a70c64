import { describe, expect, it } from 'vitest';
import { designValues } from '../../../../shared/engine/lumber';
import { mpaToPsi, type MPa } from '../../../../shared/engine/units';

const psiOf = (v: MPa) => mpaToPsi(v);

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
