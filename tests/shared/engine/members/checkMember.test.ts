import { describe, expect, it } from 'vitest';
import { checkMember, tensionBendingIndex } from '../../../../shared/engine/members';
import { MPA_PER_PSI } from '../../../../shared/engine/units';
import { LB_IN, LB_N } from './helpers';

const IN = 25.4;

describe('Example C — 2x6 DF-L No.1 stud, lu = 14 ft (MST course 5260, Problem 7.32)', () => {
  // Values from engineering.md §2: V — A 8.25, le/d 30.55, FcE 546.2, Fc* per CD;
  // C — Cp 0.3343 (D) / 0.3044 (L) / 0.2484 (Lr) / 0.1972 (W); interaction 0.488 and 0.769
  // with Fb′ = 1000·1.6·1.3·1.15 = 2,392 psi (16 in. o.c. → Cr).
  const base = {
    lumberId: '2x6 DFL-1',
    plies: 1,
    leStrong: 14 * 12 * IN,
    leWeak: 0, // sheathing braces the weak axis
    repetitive: true,
  };
  const psi = (mpaValue: number) => mpaValue / MPA_PER_PSI;

  it.each([
    [0.9, 0.3343],
    [1.0, 0.3044],
    [1.25, 0.2484],
    [1.6, 0.1972],
  ])('Cp at CD %s = %s', (cd, cp) => {
    const r = checkMember({ ...base, axial: -1000, moment: 0, cd });
    expect(r.slenderness.strong).toBeWithin(30.55, { abs: 0.005 });
    expect(psi(r.capacities.fcEStrong)).toBeWithin(546.2, { abs: 0.05 });
    expect(r.capacities.cp).toBeWithin(cp, { abs: 1e-4 });
    expect(r.governing).toBe('compression');
  });

  // Per stud (16 in. o.c.): D = 800 plf → 1,067 lb; D + 0.75(L + Lr) = 1,700 plf → 2,267 lb;
  // W = 15 psf → 20 plf → M = wL²/8 = 490 lb·ft.
  const stud = 16 / 12;
  const mWind = ((20 * 14 ** 2) / 8) * 12; // lb·in

  it('D + W: interaction 0.488 (NDS 2018 3.9.2)', () => {
    const r = checkMember({ ...base, axial: -800 * stud * LB_N, moment: mWind * LB_IN, cd: 1.6 });
    expect(r.ratios.compressionBending).toBeWithin(0.488, { abs: 6e-4 });
    expect(r.governing).toBe('compression+bending');
    expect(r.csi).toBe(r.ratios.compressionBending);
  });

  it('D + 0.75(W + L + Lr): interaction 0.769', () => {
    const r = checkMember({
      ...base,
      axial: -(800 + 0.75 * 1200) * stud * LB_N,
      moment: 0.75 * mWind * LB_IN,
      cd: 1.6,
    });
    expect(r.ratios.compressionBending).toBeWithin(0.769, { abs: 6e-4 });
  });
});

describe('tension', () => {
  it('MST 5260 Problem 7.1: Ft′ = 1000·1.6·1.2 = 1,920 psi; ft = 20,000/15.79 = 1,267 psi', () => {
    const ftPrime = 1000 * 1.6 * 1.2;
    expect(ftPrime).toBeWithin(1920);
    const ft = 20_000 / 15.79;
    expect(ft).toBeWithin(1267, { abs: 0.5 });
    // With no bending, NDS 3.9.1 reduces to ft/Ft′.
    expect(tensionBendingIndex(ft, ftPrime, 0, 1)).toBeWithin(ft / ftPrime);
    expect(ftPrime * 15.79).toBeWithin(30_320, { abs: 5 });
  });

  it('SPF No.1/No.2 2x4 under snow carries 4,075 lb at CSI 1.0 (engineering.md §2, C)', () => {
    const r = checkMember({
      lumberId: '2x4 SPF-1/2',
      plies: 1,
      axial: 4075 * LB_N,
      moment: 0,
      leStrong: 2000,
      leWeak: 0,
      cd: 1.15,
      repetitive: true,
    });
    expect(r.governing).toBe('tension');
    expect(r.csi).toBeWithin(4075 / 4075.3125, { rel: 1e-9 });
    expect(r.ratios.slenderness).toBeUndefined();
  });
});

describe('combined and limits (hand calcs with NDS 2018 3.9.1 / 3.7.1.4)', () => {
  const spf = {
    lumberId: '2x4 SPF-1/2',
    plies: 1,
    leStrong: 1500,
    leWeak: 0,
    cd: 1.15,
    repetitive: true,
  };

  it('tension + bending = ft/Ft′ + fb/Fb′', () => {
    const r = checkMember({ ...spf, axial: 5000, moment: 400_000 });
    const area = 38.1 * 88.9;
    const sx = (38.1 * 88.9 ** 2) / 6;
    const ft = 5000 / area;
    const fb = 400_000 / sx;
    expect(r.ratios.tensionBending).toBeWithin(
      ft / r.capacities.ftPrime + fb / r.capacities.fbPrime,
    );
    expect(r.governing).toBe('tension+bending');
  });

  it('le/d above 50 is a clear failure', () => {
    const r = checkMember({ ...spf, axial: -100, moment: 0, leWeak: 60 * 38.1 });
    expect(r.ratios.slenderness).toBeWithin(60 / 50);
    expect(r.csi).toBeGreaterThan(1);
    expect(r.governing).toBe('compression');
    expect(r.note).toMatch(/le\/d = 60\.0 about the weak axis exceeds 50/);
  });

  it('two plies halve the stresses', () => {
    const one = checkMember({ ...spf, axial: -3000, moment: 200_000 });
    const two = checkMember({ ...spf, plies: 2, axial: -3000, moment: 200_000 });
    expect(two.stresses.axial).toBeWithin(one.stresses.axial / 2);
    expect(two.stresses.bending).toBeWithin(one.stresses.bending / 2);
  });

  it('refuses bad input with an invalid EngineError', () => {
    expect(() => checkMember({ ...spf, plies: 0, axial: 1, moment: 0 })).toThrow(/plies/);
    expect(() => checkMember({ ...spf, axial: Number.NaN, moment: 0 })).toThrow(/axial/);
    expect(() => checkMember({ ...spf, lumberId: '2x4 XYZ', axial: 1, moment: 0 })).toThrow(
      /Unknown lumber/,
    );
  });
});

describe('compression + bending with the moment split into span and panel-point parts', () => {
  // Unamplified at the panel point: (fc/Fc′)² + fb/Fb′ (common practice for continuous chords);
  // the span moment keeps NDS 2018 3.9.2's amplifier 1/(1 − fc/FcE1).
  const base = {
    lumberId: '2x4 SPF-1/2',
    plies: 1,
    axial: -8000,
    leStrong: 1500,
    leWeak: 0,
    cd: 1.25,
    repetitive: true,
  };
  it('a support moment alone is not amplified', () => {
    const plain = checkMember({ ...base, moment: 400_000 });
    const split = checkMember({ ...base, moment: 400_000, supportMoment: 400_000, spanMoment: 0 });
    const expected =
      (split.stresses.axial / -split.capacities.fcPrime) ** 2 +
      split.stresses.bending / split.capacities.fbPrime;
    expect(split.ratios.compressionBending!).toBeWithin(expected, { rel: 1e-9 });
    expect(split.ratios.compressionBending!).toBeLessThan(plain.ratios.compressionBending!);
  });
  it('a span moment alone gives the plain NDS 3.9.2 result', () => {
    const plain = checkMember({ ...base, moment: 300_000 });
    const split = checkMember({ ...base, moment: 300_000, supportMoment: 0, spanMoment: 300_000 });
    expect(split.ratios.compressionBending!).toBeWithin(plain.ratios.compressionBending!, {
      rel: 1e-12,
    });
  });
});
