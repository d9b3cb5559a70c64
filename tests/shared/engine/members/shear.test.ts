import { describe, expect, it } from 'vitest';
import { checkMember, checkShear } from '../../../../shared/engine/members';
import { MPA_PER_PSI } from '../../../../shared/engine/units';
import { LB_N } from './helpers';

/**
 * NDS 2018 §3.4.2: fv = 3V/(2bd) ≤ Fv′; Fv′ = Fv·CD·CM·Ct·Ci (NDS 2018 Table 4.3.1, no CF, no Cr).
 * Fv from the NDS 2018 Supplement Table 4A (engineering.md §1, V2): SPF No.1/No.2 135 psi,
 * DF-L No.2 180 psi. Dressed 2x4 = 1.5 × 3.5 in (5.25 in²), 2x10 = 1.5 × 9.25 in (Table 1B).
 */
describe('shear parallel to grain, NDS 2018 §3.4.2', () => {
  const psi = (v: number) => v / MPA_PER_PSI;

  it('2x4 SPF No.1/No.2, V = 500 lb, snow (CD 1.15): fv = 142.9 psi, Fv′ = 155.25 psi', () => {
    const fv = (3 * 500) / (2 * 1.5 * 3.5); // 142.857 psi
    const fvPrime = 135 * 1.15; // 155.25 psi
    const r = checkShear({ lumberId: '2x4 SPF-1/2', plies: 1, shear: 500 * LB_N, cd: 1.15 });
    expect(psi(r.fv)).toBeWithin(fv, { rel: 1e-9 });
    expect(psi(r.fvPrime)).toBeWithin(fvPrime, { rel: 1e-9 });
    expect(r.ratio).toBeWithin(0.9202, { abs: 1e-4 });
  });

  it('two plies of 2x10 DF-L No.2 double b; Fv = 180 psi takes no size factor', () => {
    const fv = (3 * 2000) / (2 * 3.0 * 9.25); // 108.1 psi
    const r = checkShear({ lumberId: '2x10 DFL-2', plies: 2, shear: 2000 * LB_N, cd: 1 });
    expect(r.ratio).toBeWithin(fv / 180, { rel: 1e-9 });
  });

  it('the sign of V does not matter; bad plies are refused', () => {
    const a = checkShear({ lumberId: '2x4 SPF-1/2', plies: 1, shear: -300 * LB_N, cd: 0.9 });
    expect(a.ratio).toBeWithin((1.5 * 300) / 5.25 / (135 * 0.9), { rel: 1e-9 });
    expect(() => checkShear({ lumberId: '2x4 SPF-1/2', plies: 0, shear: 1, cd: 1 })).toThrow(
      /plies/,
    );
  });
});

describe('shear in the member check (CSI)', () => {
  const base = {
    lumberId: '2x4 SPF-1/2',
    plies: 1,
    leStrong: 1000,
    leWeak: 0,
    cd: 1.0,
    repetitive: true,
  };

  it('a short member with little moment and a large shear is governed by shear', () => {
    // V = 600 lb: fv = 1.5·600/5.25 = 171.4 psi > Fv′ = 135 psi → 1.270.
    const r = checkMember({ ...base, axial: 100 * LB_N, moment: 0, shear: 600 * LB_N });
    expect(r.governing).toBe('shear');
    expect(r.csi).toBeWithin((1.5 * 600) / 5.25 / 135, { rel: 1e-9 });
    expect(r.ratios.shear).toBe(r.csi);
  });

  it('without a shear the check is unchanged', () => {
    const a = checkMember({ ...base, axial: -2000 * LB_N, moment: 0 });
    expect(a.ratios.shear).toBeUndefined();
  });
});
