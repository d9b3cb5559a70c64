import { describe, expect, it } from 'vitest';
import {
  partialTopChordLoad,
  ridgeX,
  scaleCase,
  sideProfile,
  sumCases,
} from '../../../../shared/engine/loads/roofSides';
import type { CaseLoads } from '../../../../shared/engine/loads';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';
import { finkWithLengths as profile } from './support/finkProfile';

const panel = Math.hypot(1500, 500); // top-chord member length, mm
const fy = (c: CaseLoads, joint: string) => c.jointLoads.find((j) => j.joint === joint)?.fy;

describe('ridge and roof sides', () => {
  it('the ridge is the highest top-chord joint; a mono or flat truss splits at mid-span', () => {
    expect(ridgeX(profile)).toBe(3000);
    // C lowered below B and D (both 500 mm high): the first highest joint, B, is the ridge.
    const low = {
      ...profile,
      joints: profile.joints.map((j) => (j.id === 'C' ? { ...j, y: 400 } : j)),
    };
    expect(ridgeX(low)).toBe(1500);
    expect(ridgeX({ ...low, params: { ...low.params, kind: 'mono' } })).toBe(3000);
    expect(ridgeX({ ...low, params: { ...low.params, kind: 'flat' } })).toBe(3000);
  });

  it('one side keeps its own top chord and overhang and every other member', () => {
    const ids = (p: TrussProfile) => p.members.map((m) => m.id);
    expect(ids(sideProfile(profile, 'left'))).toEqual([
      'AB',
      'BC',
      'AF',
      'FG',
      'GE',
      'BF',
      'CF',
      'CG',
      'DG',
    ]);
    expect(ids(sideProfile(profile, 'right'))).toEqual([
      'CD',
      'DE',
      'AF',
      'FG',
      'GE',
      'BF',
      'CF',
      'CG',
      'DG',
    ]);
    expect(sideProfile(profile, 'left').overhangs.map((o) => o.side)).toEqual(['left']);
    expect(sideProfile(profile, 'right').overhangs.map((o) => o.side)).toEqual(['right']);
  });
});

describe('scaling and summing cases (loads are linear in the pressure)', () => {
  const a: CaseLoads = {
    jointLoads: [
      { joint: 'A', fy: -10 },
      { joint: 'B', fx: 2, fy: -4 },
    ],
    memberLoads: [{ member: 'AB', transverse: 0.5 }],
    overhangMoments: [{ side: 'left', heelJoint: 'A', member: 'AB', moment: 100 }],
  };
  it('scales every force, line load and moment; no case scales to nothing', () => {
    expect(scaleCase(a, -2)).toEqual({
      jointLoads: [
        { joint: 'A', fx: -0, fy: 20 },
        { joint: 'B', fx: -4, fy: 8 },
      ],
      memberLoads: [{ member: 'AB', transverse: -1 }],
      overhangMoments: [{ side: 'left', heelJoint: 'A', member: 'AB', moment: -200 }],
    });
    expect(scaleCase(undefined, 3)).toEqual({
      jointLoads: [],
      memberLoads: [],
      overhangMoments: [],
    });
  });

  it('sums joint by joint, member by member and side by side, skipping absent cases', () => {
    const b: CaseLoads = {
      jointLoads: [
        { joint: 'B', fx: 1 },
        { joint: 'C', fy: -3 },
      ],
      memberLoads: [
        { member: 'AB', transverse: 0.25 },
        { member: 'BC', transverse: 1 },
      ],
      overhangMoments: [
        { side: 'left', heelJoint: 'A', member: 'AB', moment: 50 },
        { side: 'right', heelJoint: 'E', member: 'DE', moment: 7 },
      ],
    };
    expect(sumCases(a, undefined, b)).toEqual({
      jointLoads: [
        { joint: 'A', fx: 0, fy: -10 },
        { joint: 'B', fx: 3, fy: -4 },
        { joint: 'C', fx: 0, fy: -3 },
      ],
      memberLoads: [
        { member: 'AB', transverse: 0.75 },
        { member: 'BC', transverse: 1 },
      ],
      overhangMoments: [
        { side: 'left', heelJoint: 'A', member: 'AB', moment: 150 },
        { side: 'right', heelJoint: 'E', member: 'DE', moment: 7 },
      ],
    });
    // The inputs are left as they were.
    expect(a.overhangMoments[0].moment).toBe(100);
  });
});

describe('a partial top-chord load, by simple-beam statics (hand calcs)', () => {
  it('1 N/mm over the last 1000 mm of the 1500 mm run of BC: B 333.3 N, C 666.7 N, Mmax 222,222 N·mm', () => {
    // Reactions by moments about C and B; the largest moment of a uniform load w over the last
    // c of a span L sits where the shear vanishes: M = R1·(a + R1/(2w)), R1 = w·c²/(2L).
    const r1 = (1 * 1000 ** 2) / (2 * 1500);
    const mMax = r1 * (500 + r1 / 2);
    expect(mMax).toBeWithin(222_222.2, { abs: 0.1 });
    for (const [x1, x2] of [
      [2000, 3000],
      [3000, 2000],
    ]) {
      const c = partialTopChordLoad(profile, 1, x1, x2);
      expect(c.jointLoads.map((j) => j.joint)).toEqual(['B', 'C']);
      expect(fy(c, 'B')).toBeWithin(-r1, { rel: 1e-12 });
      expect(fy(c, 'C')).toBeWithin(-(1000 - r1), { rel: 1e-12 });
      expect(c.memberLoads).toHaveLength(1);
      // The equivalent uniform load across the member: 8·Mmax/L², L along the slope.
      expect(c.memberLoads[0].member).toBe('BC');
      expect(c.memberLoads[0].transverse).toBeWithin((8 * mMax) / panel ** 2, { rel: 1e-12 });
    }
  });

  it('a load over a panel point splits between the two members and sums at B', () => {
    // [1000, 2000]: 500 N on AB at 1250 (B takes 500·1250/1500), 500 N on BC at 1750.
    const c = partialTopChordLoad(profile, 1, 1000, 2000);
    expect(fy(c, 'A')).toBeWithin(-500 * (250 / 1500), { rel: 1e-12 });
    expect(fy(c, 'B')).toBeWithin(-2 * 500 * (1250 / 1500), { rel: 1e-12 });
    expect(fy(c, 'C')).toBeWithin(-500 * (250 / 1500), { rel: 1e-12 });
    // Load over the first 500 mm next to B on each member: same Mmax both sides.
    const r1 = 500 ** 2 / (2 * 1500);
    const m = r1 * (1000 + r1 / 2);
    for (const member of ['AB', 'BC']) {
      expect(c.memberLoads.find((l) => l.member === member)!.transverse).toBeWithin(
        (8 * m) / panel ** 2,
        { rel: 1e-12 },
      );
    }
  });

  it('the whole panel gives w·L_h²/8 and no load gives nothing', () => {
    const c = partialTopChordLoad(profile, 2, 0, 1500);
    expect(c.memberLoads).toEqual([
      { member: 'AB', transverse: expect.closeTo((8 * ((2 * 1500 ** 2) / 8)) / panel ** 2, 9) },
    ]);
    expect(partialTopChordLoad(profile, 0, 0, 6000).jointLoads).toEqual([]);
    expect(partialTopChordLoad(profile, 1, 1500, 1500).jointLoads).toEqual([]);
  });
});
