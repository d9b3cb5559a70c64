import { describe, expect, it } from 'vitest';
import {
  checkBearing,
  checkMember,
  checkShear,
  columnDesignValue,
  columnStabilityFactor,
  compressionBendingIndex,
  type MemberCheckInput,
} from '../../../../shared/engine/members';
import { MPA_PER_PSI } from '../../../../shared/engine/units';
import { engineErrorOf as refusal } from '../analysis/support/errors';
import { LB_IN, LB_N } from './helpers';

/**
 * Cases the mutation run (README, "Mutation testing") showed untested: refusals, the branches of
 * the member check, the notes and the axis that governs. Hand calculations in psi from the NDS
 * 2018 Supplement Table 4A, SPF No.1/No.2 (Fb 875, Ft 450, Fc 1150, Fc⊥ 425, Emin 510,000; CF
 * Fb/Ft 1.5, Fc 1.15 for a 2x4), a dressed 2x4 of 1.5 × 3.5 in. (A = 5.25 in², Sx = 3.0625 in³,
 * Supplement Table 1B), Cr = 1.15 (NDS 2018 4.3.9) and Eq. 3.7-1 with c = 0.8 — no engine
 * capacity is reused.
 */
const IN = 25.4;
const psi = (mpaValue: number) => mpaValue / MPA_PER_PSI;
const spf: Omit<MemberCheckInput, 'axial' | 'moment'> = {
  lumberId: '2x4 SPF-1/2',
  plies: 1,
  leStrong: 24 * IN,
  leWeak: 0,
  cd: 1.15,
  repetitive: true,
};

/** NDS 2018 Eq. 3.7-1 in its textbook form (c = 0.8). */
function cpByHand(fcStar: number, slenderness: number): number {
  const fcE = (0.822 * 510_000) / slenderness ** 2;
  const a = fcE / fcStar;
  const h = (1 + a) / 1.6;
  return h - Math.sqrt(h * h - a / 0.8);
}

const SLENDER_TAIL = '(NDS 2018 3.7.1.4): add a lateral brace or use a larger size.';
const WEAK_NOTE = 'Weak-axis buckling governs Fc′: a lateral brace would shorten le (weak).';

describe('refusals carry the invalid code and their inputs', () => {
  it('bearing: plies 0, 1.5 or a non-finite reaction', () => {
    for (const [plies, reaction] of [
      [0, 1000],
      [1.5, 1000],
      [1, Number.NaN],
      [1, Number.POSITIVE_INFINITY],
    ]) {
      const e = refusal(() =>
        checkBearing({ lumberId: '2x4 SPF-1/2', plies, reaction, bearingLength: 89 }),
      );
      expect(e.code).toBe('invalid');
      expect(e.message).toBe('Bearing check: plies must be ≥ 1 and the reaction finite.');
      expect(e.details).toEqual({ plies, reaction });
    }
  });

  it('shear and the column stability factor', () => {
    const shear = refusal(() => checkShear({ lumberId: '2x4 SPF-1/2', plies: 0, shear: 1, cd: 1 }));
    expect(shear.code).toBe('invalid');
    expect(shear.details).toEqual({ plies: 0, shear: 1 });
    const cp = refusal(() => columnStabilityFactor(1000, 0));
    expect(cp.code).toBe('invalid');
    expect(cp.details).toEqual({ fcStar: 1000, fcE: 0 });
  });

  it('member check: each bad input is named, several are joined', () => {
    const cases: [Partial<MemberCheckInput>, string][] = [
      [{ moment: Number.NaN }, 'moment must be a finite number'],
      [{ leStrong: -1 }, 'leStrong must be ≥ 0'],
      [{ leStrong: Number.POSITIVE_INFINITY }, 'leStrong must be ≥ 0'],
      [{ leWeak: -1 }, 'leWeak must be ≥ 0'],
      [{ leWeak: Number.POSITIVE_INFINITY }, 'leWeak must be ≥ 0'],
    ];
    for (const [bad, text] of cases) {
      const input = { ...spf, axial: -1000, moment: 0, ...bad };
      const e = refusal(() => checkMember(input));
      expect(e.code).toBe('invalid');
      expect(e.message).toBe(`Member check: ${text}.`);
      expect(e.details).toEqual(input);
    }
    const both = refusal(() =>
      checkMember({ ...spf, axial: -1, moment: 0, leStrong: -1, leWeak: -1 }),
    );
    expect(both.message).toBe('Member check: leStrong must be ≥ 0; leWeak must be ≥ 0.');
  });

  it('zero effective lengths (fully braced) are accepted', () => {
    const r = checkMember({ ...spf, axial: -1000, moment: 0, leStrong: 0, leWeak: 0 });
    expect(r.capacities.cp).toBe(1);
    expect(r.note).toBeUndefined();
  });
});

describe('bearing area factor in Fc⊥′ (NDS 2018 3.10.4)', () => {
  it('1.5 in. interior bearing: Fc⊥′ = 425 × 1.25 = 531.25 psi; R = 1,000 lb → 444.4 psi', () => {
    // Cb = (lb + 0.375)/lb = 1.25 for lb = 1.5 in. (NDS 2018 Table 3.10.4).
    const r = checkBearing({
      lumberId: '2x4 SPF-1/2',
      plies: 1,
      reaction: 1000 * LB_N,
      bearingLength: 1.5 * IN,
      distanceFromEnd: 10 * IN,
    });
    expect(psi(r.fcPerpPrime)).toBeWithin(531.25, { rel: 1e-9 });
    expect(psi(r.stress)).toBeWithin(1000 / (1.5 * 1.5), { rel: 1e-9 });
    expect(r.ratio).toBeWithin(1000 / 2.25 / 531.25, { rel: 1e-9 });
  });
});

describe('Cp: which axis governs (NDS 2018 3.7.1)', () => {
  it('2x4 braced at 24 in. across its width, 48 in. in plane: the weak axis governs', () => {
    const fcStar = 1150 * 1.15; // Fc·CF, CD 1.0
    const r = columnDesignValue({
      fcStar,
      eminPrime: 510_000,
      leStrong: 48,
      d: 3.5,
      leWeak: 24,
      b: 1.5,
    });
    expect(r.governingAxis).toBe('weak');
    expect(r.cp).toBeWithin(cpByHand(fcStar, 24 / 1.5), { rel: 1e-9 });
    expect(r.cpStrong).toBeWithin(cpByHand(fcStar, 48 / 3.5), { rel: 1e-9 });
  });

  it('fully braced about both axes: Cp = 1, reported as the strong axis', () => {
    const r = columnDesignValue({
      fcStar: 1000,
      eminPrime: 510_000,
      leStrong: 0,
      d: 3.5,
      leWeak: 0,
      b: 1.5,
    });
    expect(r.cp).toBe(1);
    expect(r.governingAxis).toBe('strong');
  });
});

describe('NDS 2018 3.9.2 needs fc < FcE1', () => {
  it('fc = FcE1 exactly already buckles', () => {
    expect(compressionBendingIndex(5, 10, 1, 10, 5)).toEqual({ index: 1, buckles: true });
  });
});

describe('member check branches', () => {
  it('no axial force: bending only, fb/Fb′ = 1,632.65 / 1,509.38 (CD 1.0)', () => {
    const fbPrime = 875 * 1.0 * 1.5 * 1.15;
    const r = checkMember({ ...spf, cd: 1.0, axial: 0, moment: 5000 * LB_IN });
    expect(Object.keys(r.ratios)).toEqual(['bending']);
    expect(r.ratios.bending).toBeWithin(5000 / 3.0625 / fbPrime, { rel: 1e-9 });
    expect(r.governing).toBe('bending');
    expect(r.stresses.axial).toBe(0);
    expect(r.note).toBeUndefined();
  });

  it('compression without moment: only fc/Fc′; the axial stress is reported negative', () => {
    const r = checkMember({ ...spf, axial: -1500 * LB_N, moment: 0 });
    expect(Object.keys(r.ratios)).toEqual(['compression']);
    expect(psi(r.stresses.axial)).toBeWithin(-1500 / 5.25, { rel: 1e-9 });
    expect(r.note).toBeUndefined();
  });

  it('a small shear does not take the CSI from tension', () => {
    const ftPrime = 450 * 1.15 * 1.5;
    const r = checkMember({ ...spf, axial: 2000 * LB_N, moment: 0, shear: 50 * LB_N });
    expect(r.governing).toBe('tension');
    expect(r.csi).toBeWithin(2000 / 5.25 / ftPrime, { rel: 1e-9 });
    expect(r.ratios.shear).toBeWithin((1.5 * 50) / 5.25 / (135 * 1.15), { rel: 1e-9 });
  });

  it('a support moment without a span moment: the span moment defaults to the whole moment', () => {
    const plain = checkMember({ ...spf, axial: -1500 * LB_N, moment: 2000 * LB_IN });
    const split = checkMember({
      ...spf,
      axial: -1500 * LB_N,
      moment: 2000 * LB_IN,
      supportMoment: 1000 * LB_IN,
    });
    expect(split.ratios.compressionBending).toBeWithin(plain.ratios.compressionBending!, {
      rel: 1e-12,
    });
    expect(plain.note).toBeUndefined();
  });

  it('fc above FcE in plane: le/d 40, P = 1,575 lb (fc 300 psi > FcE 262.0 psi) buckles', () => {
    const fcStar = 1150 * 1.15 * 1.15;
    const fcE = (0.822 * 510_000) / 40 ** 2; // 262.01 psi
    const fcPrime = fcStar * cpByHand(fcStar, 40);
    const index = Math.max(300 / fcE, (300 / fcPrime) ** 2);
    const r = checkMember({
      ...spf,
      leStrong: 40 * 3.5 * IN,
      axial: -1575 * LB_N,
      moment: 1000 * LB_IN,
    });
    expect(psi(r.capacities.fcEStrong)).toBeWithin(fcE, { rel: 1e-9 });
    expect(r.ratios.compressionBending).toBeWithin(index, { rel: 1e-9 });
    expect(r.governing).toBe('compression+bending');
    expect(r.note).toBe(
      'fc ≥ FcE about the bending axis (NDS 2018 3.9.2): the member buckles in plane.',
    );
  });
});

describe('slenderness limit and notes (NDS 2018 3.7.1.4: le/d shall not exceed 50)', () => {
  it('le/d = 50 exactly is allowed', () => {
    const r = checkMember({ ...spf, axial: -100, moment: 0, leWeak: 50 * (1.5 * IN) });
    expect(r.slenderness.weak).toBe(50);
    expect(r.ratios.slenderness).toBeUndefined();
  });

  it('le/d = 60 in plane names the strong axis', () => {
    const r = checkMember({ ...spf, axial: -100, moment: 0, leStrong: 60 * 3.5 * IN });
    expect(r.ratios.slenderness).toBeWithin(1.2);
    expect(r.governing).toBe('compression');
    expect(r.note).toBe(`le/d = 60.0 about the strong axis exceeds 50 ${SLENDER_TAIL}`);
  });

  it('equal le/d about both axes names the weak axis', () => {
    const r = checkMember({
      ...spf,
      axial: -100,
      moment: 0,
      leStrong: 55 * 3.5 * IN,
      leWeak: 55 * 1.5 * IN,
    });
    expect(r.note).toBe(`le/d = 55.0 about the weak axis exceeds 50 ${SLENDER_TAIL}`);
  });

  it('le/d = 60 across the width, failing: both notes, joined by a space', () => {
    const r = checkMember({ ...spf, axial: -100, moment: 0, leWeak: 60 * 1.5 * IN });
    expect(r.note).toBe(`le/d = 60.0 about the weak axis exceeds 50 ${SLENDER_TAIL} ${WEAK_NOTE}`);
  });

  // Weak axis le = 60 in. (le/d 40): Fc′ = Fc*·Cp ≈ 250 psi at CD 1.15.
  const weakLong = { ...spf, leWeak: 60 * IN };
  it('weak-axis buckling that fails (P = 2,000 lb, fc = 381 psi) gets the brace note', () => {
    const fcStar = 1150 * 1.15 * 1.15;
    const r = checkMember({ ...weakLong, axial: -2000 * LB_N, moment: 0 });
    expect(r.csi).toBeWithin(2000 / 5.25 / (fcStar * cpByHand(fcStar, 40)), { rel: 1e-9 });
    expect(r.csi).toBeGreaterThan(1);
    expect(r.note).toBe(WEAK_NOTE);
  });

  it('no brace note when weak-axis buckling passes, when the strong axis governs, or without compression', () => {
    expect(checkMember({ ...weakLong, axial: -500 * LB_N, moment: 0 }).note).toBeUndefined();
    const strong = checkMember({ ...spf, leStrong: 40 * 3.5 * IN, axial: -2000 * LB_N, moment: 0 });
    expect(strong.csi).toBeGreaterThan(1);
    expect(strong.note).toBeUndefined();
    // Tension 5,000 lb: ft = 952 psi > Ft′ = 776 psi; bending 6,000 lb·in: 1,959 psi > Fb′ = 1,736 psi.
    const tension = checkMember({ ...weakLong, axial: 5000 * LB_N, moment: 0 });
    expect(tension.csi).toBeGreaterThan(1);
    expect(tension.note).toBeUndefined();
    const bending = checkMember({ ...weakLong, axial: 0, moment: 6000 * LB_IN });
    expect(bending.csi).toBeGreaterThan(1);
    expect(bending.note).toBeUndefined();
  });
});
