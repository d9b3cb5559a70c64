import { describe, expect, it } from 'vitest';
import { checkMember } from '../../../../shared/engine/members';
import { LB_IN, LB_N } from './helpers';

/**
 * NDS 2018 3.9.1 and 3.9.2 worked by hand in psi from Table 4A values (engineering.md §1) and the
 * section of a 2x4 (1.5 × 3.5 in.: A = 5.25 in², Sx = 3.0625 in³, NDS Supplement Table 1B) —
 * no engine capacity is reused.
 */
const base = { lumberId: '2x4 SPF-1/2', plies: 1, leWeak: 0, repetitive: true };

describe('NDS 2018 3.9.1, tension + bending, by hand', () => {
  it('2x4 SPF No.1/No.2, snow (CD 1.15), T = 2,000 lb, M = 5,000 lb·in: CSI 1.431', () => {
    const ft = 2000 / 5.25; // 380.95 psi
    const ftPrime = 450 * 1.15 * 1.5; // Ft·CD·CF = 776.25 psi
    const fb = 5000 / 3.0625; // 1,632.65 psi
    const fbPrime = 875 * 1.15 * 1.5 * 1.15; // Fb·CD·CF·Cr = 1,735.78 psi
    const index = ft / ftPrime + fb / fbPrime;
    expect(index).toBeWithin(1.4313, { abs: 1e-4 });
    const r = checkMember({
      ...base,
      axial: 2000 * LB_N,
      moment: 5000 * LB_IN,
      leStrong: 24 * 25.4,
      cd: 1.15,
    });
    expect(r.ratios.tension).toBeWithin(ft / ftPrime, { rel: 1e-9 });
    expect(r.ratios.bending).toBeWithin(fb / fbPrime, { rel: 1e-9 });
    expect(r.ratios.tensionBending).toBeWithin(index, { rel: 1e-9 });
    expect(r.csi).toBeWithin(index, { rel: 1e-9 });
    expect(r.governing).toBe('tension+bending');
  });
});

describe('NDS 2018 3.9.2, compression + bending, by hand', () => {
  it('2x4 SPF No.1/No.2, roof live (CD 1.25), le = 36 in. in plane, P = 1,500 lb, M = 2,000 lb·in', () => {
    // Eq. 3.7-1 with c = 0.8: FcE = 0.822·Emin/(le/d)², Fc* = Fc·CD·CF.
    const fcStar = 1150 * 1.25 * 1.15; // 1,653.13 psi
    const slenderness = 36 / 3.5;
    const fcE = (0.822 * 510_000) / slenderness ** 2; // 3,962.6 psi
    const a = fcE / fcStar;
    const h = (1 + a) / 1.6;
    const cp = h - Math.sqrt(h * h - a / 0.8);
    const fc = 1500 / 5.25;
    const fcPrime = fcStar * cp;
    const fb = 2000 / 3.0625;
    const fbPrime = 875 * 1.25 * 1.5 * 1.15;
    const index = (fc / fcPrime) ** 2 + fb / (fbPrime * (1 - fc / fcE));
    const r = checkMember({
      ...base,
      axial: -1500 * LB_N,
      moment: 2000 * LB_IN,
      leStrong: 36 * 25.4,
      cd: 1.25,
    });
    expect(r.capacities.cp).toBeWithin(cp, { rel: 1e-9 });
    expect(r.ratios.compression).toBeWithin(fc / fcPrime, { rel: 1e-9 });
    expect(r.ratios.compressionBending).toBeWithin(index, { rel: 1e-9 });
    expect(r.governing).toBe('compression+bending');
  });
});
