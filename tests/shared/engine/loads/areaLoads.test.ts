import { describe, expect, it } from 'vitest';
import { areaLoadCases, type CaseLoads } from '../../../../shared/engine/loads';
import { cos, overhangSlope, profile } from './support/finkProfile';
import { kpa, mm } from '../../../../shared/engine/units';

const spacing = mm(600);
const at = (c: CaseLoads | undefined, joint: string) =>
  c!.jointLoads.find((j) => j.joint === joint)!;
const total = (c: CaseLoads | undefined) =>
  c!.jointLoads.reduce((s, j) => ({ fx: s.fx + (j.fx ?? 0), fy: s.fy + (j.fy ?? 0) }), {
    fx: 0,
    fy: 0,
  });
const line = (c: CaseLoads | undefined, member: string) =>
  c!.memberLoads.find((m) => m.member === member)!.transverse;

describe('area loads to panel points (hand calcs, common practice tributary lumping)', () => {
  // 1 kPa × 600 mm = 0.6 N/mm. Built inside each test: the mutation run only sees code a test runs.
  const cases = () =>
    areaLoadCases(profile, spacing, {
      tcll: kpa(1),
      tcdl: kpa(0.5),
      bcdl: kpa(0.5),
      windUplift: kpa(0.4),
    });

  it('creates only the cases that have load', () => {
    expect(Object.keys(cases()).sort()).toEqual(['D', 'Lr', 'W']);
  });

  it('TCLL on horizontal projection: B gets 0.6 × 1500 = 900 N; heel A gets 0.6 × (750 + 600) = 810 N', () => {
    expect(at(cases().Lr, 'B').fy).toBeWithin(-900);
    expect(at(cases().Lr, 'C').fy).toBeWithin(-900);
    expect(at(cases().Lr, 'A').fy).toBeWithin(-810);
    expect(at(cases().Lr, 'A').fx).toBeWithin(0);
  });

  it('total applied = area × tributary: TCLL over 7200 mm run, dead over slope and bottom chord', () => {
    expect(total(cases().Lr).fy).toBeWithin(-0.6 * 7200);
    const slope = 4 * Math.hypot(1500, 500) + 2 * overhangSlope;
    expect(total(cases().D).fy).toBeWithin(-(0.3 * slope + 0.3 * 6000));
    // Uplift normal to the slope: the vertical resultant is w × horizontal run, horizontal cancels.
    expect(total(cases().W).fy).toBeWithin(0.24 * 7200);
    expect(total(cases().W).fx).toBeWithin(0, { abs: 1e-9 });
  });

  it('is symmetric about the ridge', () => {
    for (const c of [cases().Lr, cases().D, cases().W]) {
      expect(at(c, 'A').fy).toBeWithin(at(c, 'E').fy!);
      expect(at(c, 'B').fy).toBeWithin(at(c, 'D').fy!);
      expect(at(c, 'B').fx).toBeWithin(-at(c, 'D').fx!, { abs: 1e-9 });
    }
    expect(at(cases().D, 'F').fy).toBeWithin(at(cases().D, 'G').fy!);
  });

  it('wind uplift on B is normal to the chord and outward: 0.24 × 1581.1 N along (−sinθ, cosθ)', () => {
    const sin = 1 / Math.sqrt(10);
    const f = 0.24 * Math.hypot(1500, 500);
    expect(at(cases().W, 'B').fx).toBeWithin(-f * sin);
    expect(at(cases().W, 'B').fy).toBeWithin(f * cos);
  });

  it('BCDL lumps to bottom-chord joints: F gets 0.3 × 2000 = 600 N', () => {
    expect(at(cases().D, 'F').fy).toBeWithin(-600);
  });

  it('line loads across chord members: w cos²θ (horizontal), w cosθ (slope), −w (uplift)', () => {
    expect(line(cases().Lr, 'AB')).toBeWithin(0.6 * cos * cos);
    expect(line(cases().D, 'AB')).toBeWithin(0.3 * cos);
    expect(line(cases().D, 'FG')).toBeWithin(0.3);
    expect(line(cases().W, 'CD')).toBeWithin(-0.24);
    expect(cases().Lr!.memberLoads.map((m) => m.member)).not.toContain('BF');
  });

  it('overhang cantilever moments: w·a²/2 (horizontal), w·s·a/2 (slope), −w·s²/2 (uplift)', () => {
    const m = (c: CaseLoads | undefined, side: string) =>
      c!.overhangMoments.find((o) => o.side === side)!.moment;
    expect(m(cases().Lr, 'left')).toBeWithin((0.6 * 600 ** 2) / 2);
    expect(m(cases().D, 'right')).toBeWithin((0.3 * overhangSlope * 600) / 2);
    expect(m(cases().W, 'left')).toBeWithin((-0.24 * overhangSlope ** 2) / 2);
  });

  it('snow and BCLL land in S and L', () => {
    const c = areaLoadCases(profile, spacing, { snow: kpa(1), bcll: kpa(0.5) });
    expect(total(c.S).fy).toBeWithin(-0.6 * 7200);
    expect(total(c.L).fy).toBeWithin(-0.3 * 6000);
    expect(c.L!.overhangMoments).toEqual([]);
  });

  it('refuses a bad spacing or a negative load', () => {
    expect(() => areaLoadCases(profile, mm(0), {})).toThrow(/spacing/);
    expect(() => areaLoadCases(profile, spacing, { tcll: kpa(-1) })).toThrow(/tcll/);
  });
});
