import { describe, expect, it } from 'vitest';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import {
  caseFrameLoads,
  frameLoadsOf,
  memberReleases,
  memberSection,
} from '../../../../shared/engine/design/frameModel';
import { memberDemands, overhangRootLevers } from '../../../../shared/engine/design/demands';
import { designFrame } from '../../../../shared/engine/design/frameModel';
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

describe('member releases of a 16 ft king post with 12 in. overhangs', () => {
  it('each top chord, one piece from heel to peak, runs into its overhang and is hinged at the peak', () => {
    const { profile } = profileOf({ ...kingPost16(TYPICAL_LOADS), overhang: 12 });
    const r = memberReleases(profile);
    const of = (id: string) => {
      const k = profile.members.findIndex((m) => m.id === id);
      return [r.start[k], r.end[k]];
    };
    // AD from heel A to peak D, CD from heel C to peak D.
    expect(of('AD')).toEqual([false, true]);
    expect(of('CD')).toEqual([false, true]);
    expect(of('BD')).toEqual([true, true]);
  });
});

describe('overhang root levers', () => {
  it('the overhang’s slope length on the member it continues, 0 elsewhere', () => {
    // 24 in. of run at 6/12: s = 24 in. / cos(26.57°) = 26.83 in.
    const { profile } = profileOf(FINK_28_OVERHANGS);
    const levers = overhangRootLevers(profile);
    const s = (24 * Math.hypot(12, 6)) / 12;
    profile.members.forEach((m, k) =>
      expect(levers[k] / 25.4).toBeWithin(m.id === 'AE' || m.id === 'DG' ? s : 0, {
        rel: 1e-9,
        abs: 1e-12,
      }),
    );
    expect([
      ...overhangRootLevers(profileOf({ ...FINK_28_OVERHANGS, overhang: 0 }).profile),
    ]).toEqual(new Array(profile.members.length).fill(0));
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
    const kc = profile.members.findIndex((x) => x.id === 'CD');
    t[kc] = 3;
    const loads = frameLoadsOf(profile, [{ joint: 'A', fx: 30, fy: -100 }], t, new Float64Array(m));
    const s = profile.members[k].length;
    const cos = 12 / Math.hypot(12, 4);
    const sin = 4 / Math.hypot(12, 4);
    // Down normal of a chord rising to the right: (sinθ, −cosθ).
    const a = loads.joints!.find((j) => j.joint === 'A')!;
    const d = loads.joints!.find((j) => j.joint === 'D')!;
    // CD runs from heel C up to the left: its down normal is (−sinθ, −cosθ).
    const c = loads.joints!.find((j) => j.joint === 'C')!;
    expect(a.fx).toBeWithin(30 + (-2 * s * sin) / 2, { rel: 1e-9 });
    expect(a.fy).toBeWithin(-100 + (2 * s * cos) / 2, { rel: 1e-9 });
    expect(c.fx).toBeWithin((3 * s * sin) / 2, { rel: 1e-9 });
    expect(c.fy).toBeWithin((3 * s * cos) / 2, { rel: 1e-9 });
    expect(d.fx).toBeWithin((-2 * s * sin) / 2 + (3 * s * sin) / 2, { rel: 1e-9 });
    expect(d.fy).toBeWithin((2 * s * cos) / 2 + (3 * s * cos) / 2, { rel: 1e-9 });
    expect(loads.members).toEqual([
      { kind: 'uniform', member: 'AD', transverse: 2 },
      { kind: 'uniform', member: 'CD', transverse: 3 },
    ]);
  });

  it('a sum of cases: each factored, joint loads, line loads, overhang moments and point loads', () => {
    const { input, profile } = profileOf({
      ...FINK_28_OVERHANGS,
      loads: { ...TYPICAL_LOADS, windUplift: 20 },
      pointLoads: [{ x: 40, chord: 'bottom', dead: 100, live: 0, kind: 'roofLive' }],
    });
    const { cases } = designLoads(input, profile, '7-16');
    const one = caseFrameLoads(profile, [[cases.D, 1]]);
    const scaled = caseFrameLoads(profile, [
      [cases.D, 0.6],
      [undefined, 1],
    ]);
    // The uplift's horizontal parts: 0.6W is 0.6 times W's, joint by joint.
    const w = caseFrameLoads(profile, [[cases.W, 1]]);
    const w6 = caseFrameLoads(profile, [[cases.W, 0.6]]);
    expect(w.joints!.some((j) => j.fx !== 0)).toBe(true);
    w.joints!.forEach((j, i) =>
      expect(w6.joints![i].fx).toBeWithin(0.6 * j.fx!, { rel: 1e-9, abs: 1e-9 }),
    );
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

describe('reactions of every combination (statics: ΣFx = 0, ΣFy = 0)', () => {
  it('24 ft Fink on a wind site: the pin takes all horizontal load, the bearings all vertical', () => {
    const { input, profile } = profileOf({
      ...FINK_28_OVERHANGS,
      span: 24 * 12,
      pitch: 4,
      overhang: 0,
      loads: { ...TYPICAL_LOADS, wind: { speed: 115, exposure: 'C', meanRoofHeight: 15 * 12 } },
    });
    const { combinations } = designLoads(input, profile, '7-16');
    const lumber = profile.members.map(() => '2x4 SPF-1/2');
    const d = memberDemands(profile, combinations, designFrame(profile, lumber, 1));
    const s = d.supports.length;
    expect(s).toBe(2);
    const pin = d.supports.indexOf(profile.supports.find((x) => x.type === 'pin')!.joint);
    combinations.forEach((c, i) => {
      // Joint loads carry every force of the combination (line loads are lumped there too).
      const fx = c.jointLoads.reduce((a, l) => a + (l.fx ?? 0), 0);
      const fy = c.jointLoads.reduce((a, l) => a + (l.fy ?? 0), 0);
      expect(d.rx[i * s + pin]).toBeWithin(-fx, { rel: 1e-6, abs: 1e-6 });
      expect(d.rx[i * s + (1 - pin)]).toBeWithin(0, { abs: 1e-6 });
      expect(d.ry[i * s] + d.ry[i * s + 1]).toBeWithin(-fy, { rel: 1e-6 });
    });
    expect(combinations.some((c) => c.jointLoads.some((l) => (l.fx ?? 0) !== 0))).toBe(true);
  });
});
