import { describe, expect, it } from 'vitest';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import {
  caseFrameLoads,
  frameLoadsOf,
  memberReleases,
  memberSection,
} from '../../../../shared/engine/design/frameModel';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { engineInput, FINK_28_OVERHANGS, kingPost16, TYPICAL_LOADS } from './support/inputs';

/**
 * The design frame's ingredients, by hand: releases (common practice: chords continuous within a
 * piece of lumber, hinged where it ends, webs pinned), sections (NDS 2018 Supplement Tables 1B
 * and 4A) and loads (statics). Built inside each test (README, mutation testing).
 */
const profileOf = (draft: DesignInputDraft) => {
  const input = engineInput(draft);
  return { input, profile: generateProfile({ ...input.profile, heelHeight: 0 }) };
};

describe('member releases of the 28 ft 6/12 Fink (pieces TC1 = AE+EF, TC2 = FG+DG, BC1 = AB, BC2 = BC+CD)', () => {
  const releases = (overhang: number) => {
    const { profile } = profileOf({ ...FINK_28_OVERHANGS, overhang });
    const r = memberReleases(profile);
    return Object.fromEntries(profile.members.map((m, k) => [m.id, [r.start[k], r.end[k]]]));
  };
  // [start hinged, end hinged]: peak F and splice B hinge, E, G and C are inside a piece.
  const common = {
    EF: [false, true],
    FG: [true, false],
    AB: [true, true],
    BC: [true, false],
    CD: [false, true],
    BE: [true, true],
    BF: [true, true],
    CF: [true, true],
    CG: [true, true],
  };

  it('24 in. overhangs: the top chord runs on through each heel into its overhang', () => {
    expect(releases(24)).toEqual({ ...common, AE: [false, false], DG: [false, false] });
  });

  it('no overhang: the top chord is hinged at each heel', () => {
    expect(releases(0)).toEqual({ ...common, AE: [true, false], DG: [true, false] });
  });
});

describe('member section (NDS 2018 Supplement Table 1B, Table 4A)', () => {
  it('2 plies of 2x6 SPF No.1/No.2: E 1,400,000 psi, A 2 × 8.25 in², I 2 × 20.80 in⁴', () => {
    const s = memberSection('2x6 SPF-1/2', 2);
    expect(s.e).toBeWithin(1.4e6 * 0.00689475729, { rel: 1e-6 });
    expect(s.a / 25.4 ** 2).toBeWithin(2 * 8.25, { rel: 1e-9 });
    expect(s.i / 25.4 ** 4).toBeWithin(2 * 20.8, { rel: 1e-3 });
  });
});

describe('frame loads (statics)', () => {
  it('an overhang moment M acts at its heel: + (counter-clockwise) on the left, − on the right', () => {
    // Gravity on a left overhang, left of its heel, turns the heel counter-clockwise (x·Fy with
    // x < 0 and Fy < 0); on the right, clockwise.
    const { profile } = profileOf({ ...FINK_28_OVERHANGS, loads: TYPICAL_LOADS });
    const m = profile.members.length;
    const moments = new Float64Array(m);
    for (const o of profile.overhangs)
      moments[profile.members.findIndex((x) => x.id === o.member)] = 5e5;
    const loads = frameLoadsOf(profile, [], new Float64Array(m), moments);
    for (const o of profile.overhangs) {
      const at = loads.joints!.find((j) => j.joint === o.heelJoint)!;
      expect(at.m).toBe(o.side === 'left' ? 5e5 : -5e5);
      expect(at.fx).toBe(0);
      expect(at.fy).toBe(0);
    }
    expect(loads.members).toEqual([]);
  });

  it('a line load across a member leaves its lumped halves and returns as a uniform load', () => {
    // 16 ft 4/12 king post: a transverse load t on the left top chord AD (length s): the joint
    // loads lose t·s/2 along the down normal at A and D, the member carries t.
    const { profile } = profileOf(kingPost16(TYPICAL_LOADS));
    const m = profile.members.length;
    const k = profile.members.findIndex((x) => x.id === 'AD');
    const t = new Float64Array(m);
    t[k] = 2;
    const loads = frameLoadsOf(profile, [{ joint: 'A', fx: 0, fy: -100 }], t, new Float64Array(m));
    const s = profile.members[k].length;
    const cos = 12 / Math.hypot(12, 4);
    const sin = 4 / Math.hypot(12, 4);
    // Down normal of a chord rising to the right: (sinθ, −cosθ).
    const a = loads.joints!.find((j) => j.joint === 'A')!;
    const d = loads.joints!.find((j) => j.joint === 'D')!;
    expect(a.fx).toBeWithin((-2 * s * sin) / 2, { rel: 1e-9 });
    expect(a.fy).toBeWithin(-100 + (2 * s * cos) / 2, { rel: 1e-9 });
    expect(d.fx).toBeWithin((-2 * s * sin) / 2, { rel: 1e-9 });
    expect(d.fy).toBeWithin((2 * s * cos) / 2, { rel: 1e-9 });
    expect(loads.members).toEqual([{ kind: 'uniform', member: 'AD', transverse: 2 }]);
  });

  it('a sum of cases: each factored, joint loads, line loads, overhang moments and point loads', () => {
    const { input, profile } = profileOf({
      ...FINK_28_OVERHANGS,
      pointLoads: [{ x: 40, chord: 'bottom', dead: 100, live: 0, kind: 'roofLive' }],
    });
    const { cases } = designLoads(input, profile, '7-16');
    const one = caseFrameLoads(profile, [[cases.D, 1]]);
    const scaled = caseFrameLoads(profile, [
      [cases.D, 0.6],
      [undefined, 1],
    ]);
    const sum = caseFrameLoads(profile, [
      [cases.D, 0.5],
      [cases.D, 0.5],
    ]);
    for (const [f, loads] of [
      [0.6, scaled],
      [1, sum],
    ] as const) {
      expect(loads.joints!.map((j) => j.joint)).toEqual(one.joints!.map((j) => j.joint));
      loads.joints!.forEach((j, i) => {
        const o = one.joints![i];
        expect(j.fx).toBeWithin(f * o.fx!, { rel: 1e-9, abs: 1e-9 });
        expect(j.fy).toBeWithin(f * o.fy!, { rel: 1e-9, abs: 1e-9 });
        expect(j.m).toBeWithin(f * o.m!, { rel: 1e-9, abs: 1e-9 });
      });
      const uniform = (x: typeof one) =>
        x.members!.flatMap((l) => (l.kind === 'uniform' ? [[l.member, l.transverse!]] : []));
      const u = uniform(loads);
      expect(u.map(([id]) => id)).toEqual(uniform(one).map(([id]) => id));
      uniform(one).forEach(([, t], i) =>
        expect(u[i][1]).toBeWithin(f * (t as number), { rel: 1e-9 }),
      );
      const pointSum = (x: typeof one) =>
        x.members!.reduce((acc, l) => acc + (l.kind === 'point' ? l.fy! : 0), 0);
      expect(pointSum(loads)).toBeWithin(f * pointSum(one), { rel: 1e-9 });
    }
    // The 100 lb dead point load is there once, down.
    const points = one.members!.filter((l) => l.kind === 'point');
    expect(points).toHaveLength(1);
    expect(points[0].kind === 'point' && points[0].fy! / 4.4482216152605).toBeWithin(-100, {
      rel: 1e-9,
    });
    // Overhang moments reach the heels.
    for (const o of profile.overhangs)
      expect(Math.abs(one.joints!.find((j) => j.joint === o.heelJoint)!.m!)).toBeGreaterThan(0);
  });
});
