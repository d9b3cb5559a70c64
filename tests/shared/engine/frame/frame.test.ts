import { describe, expect, it } from 'vitest';
import { analyzeTruss } from '../../../../shared/engine/analysis';
import { prepareFrame, solveFrame, type FrameModel } from '../../../../shared/engine/frame';
import { generateProfile } from '../../../../shared/engine/profiles';

// Demo section: a 2x4 on edge (38 × 89 mm), E = 9650 MPa. Closed forms below do not depend on it.
const SECTION = { e: 9650, a: 38 * 89, i: (38 * 89 ** 3) / 12 };
const L = 3000;
const w = 2.5; // N/mm

const line = (xs: number[], releases: boolean[] = []): FrameModel => ({
  joints: xs.map((x, k) => ({ id: `J${k}`, x, y: 0 })),
  members: xs.slice(1).map((_, k) => ({
    id: `M${k}`,
    from: `J${k}`,
    to: `J${k + 1}`,
    ...SECTION,
    releaseEnd: releases[k + 1] ?? false,
    releaseStart: releases[k] ?? false,
  })),
  supports: xs.map((_, k) => ({ joint: `J${k}`, type: k === 0 ? 'pin' : 'roller' })),
});

describe('plane frame: closed forms', () => {
  it('two equal continuous spans under uniform load: support moment wL²/8, reactions 3wL/8 and 5wL/4', () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23 "Shears, Moments and Deflections",
    // continuous beam – two equal spans – uniform load on both spans: R₁ = R₃ = 3wL/8,
    // R₂ = 10wL/8, M at the interior support = −wL²/8, max span moment 9wL²/128 at 3L/8.
    const frame = prepareFrame(line([0, L, 2 * L]));
    const r = solveFrame(frame, {
      members: ['M0', 'M1'].map((member) => ({ kind: 'uniform' as const, member, wy: -w })),
    });
    expect(r.reactions.map((x) => x.ry)).toEqual([
      expect.closeTo((3 * w * L) / 8, 6),
      expect.closeTo((10 * w * L) / 8, 6),
      expect.closeTo((3 * w * L) / 8, 6),
    ]);
    expect(r.members[0].endMoment).toBeCloseTo((-w * L * L) / 8, 3);
    expect(r.members[1].startMoment).toBeCloseTo((-w * L * L) / 8, 3);
    expect(r.members[0].startMoment).toBeCloseTo(0, 6);
    expect(r.members[0].spanMoment).toBeCloseTo((9 * w * L * L) / 128, 3);
    expect(r.members[0].maxMoment).toBeCloseTo((w * L * L) / 8, 3);
    // Shear at the interior support 5wL/8 (same table).
    expect(r.members[0].maxShear).toBeCloseTo((5 * w * L) / 8, 6);
    expect(r.residual).toBeLessThan(1e-9);
  });

  it('a hinge over the interior support leaves two simple spans: wL²/8, reactions wL/2 and wL', () => {
    const frame = prepareFrame(line([0, L, 2 * L], [false, true, false]));
    const r = solveFrame(frame, {
      members: ['M0', 'M1'].map((member) => ({ kind: 'uniform' as const, member, wy: -w })),
    });
    expect(r.reactions.map((x) => x.ry)).toEqual([
      expect.closeTo((w * L) / 2, 6),
      expect.closeTo(w * L, 6),
      expect.closeTo((w * L) / 2, 6),
    ]);
    expect(r.members[0].endMoment).toBeCloseTo(0, 6);
    expect(r.members[0].spanMoment).toBeCloseTo((w * L * L) / 8, 3);
  });

  it('a point load at mid-span of a simple beam: PL/4 under the load, P/2 shear', () => {
    // Same table, simple beam – concentrated load at center: M max = PL/4.
    const P = 4000;
    const frame = prepareFrame(line([0, L]));
    const r = solveFrame(frame, { members: [{ kind: 'point', member: 'M0', at: L / 2, fy: -P }] });
    expect(r.members[0].spanMoment).toBeCloseTo((P * L) / 4, 3);
    expect(r.members[0].maxShear).toBeCloseTo(P / 2, 6);
    expect(r.reactions[1].ry).toBeCloseTo(P / 2, 6);
  });

  it('a load per horizontal projection on a sloped simple beam: M = q·a²/8 over its run a', () => {
    // Statics of an inclined simply supported beam (any strength-of-materials text): the moment
    // depends only on the horizontal run a and the load per unit run q.
    const run = 4000;
    const frame = prepareFrame({
      joints: [
        { id: 'A', x: 0, y: 0 },
        { id: 'B', x: run, y: run / 2 },
      ],
      members: [{ id: 'AB', from: 'A', to: 'B', ...SECTION }],
      supports: [
        { joint: 'A', type: 'pin' },
        { joint: 'B', type: 'roller' },
      ],
    });
    const r = solveFrame(frame, {
      members: [{ kind: 'uniform', member: 'AB', wy: -w, per: 'horizontal' }],
    });
    expect(r.members[0].spanMoment).toBeCloseTo((w * run * run) / 8, 3);
    expect(r.reactions[0].ry + r.reactions[1].ry).toBeCloseTo(w * run, 6);
  });

  it('refuses a mechanism', () => {
    // Both members hinged at the middle joint, which has a roller only at the ends: a hinge chain.
    const model: FrameModel = {
      ...line([0, L, 2 * L], [false, true, false]),
      supports: [
        { joint: 'J0', type: 'pin' },
        { joint: 'J2', type: 'roller' },
      ],
    };
    expect(() => prepareFrame(model)).toThrow(/unstable/);
  });
});

describe('plane frame with every moment released', () => {
  it('reproduces the method of joints on a Fink (axial forces to 1e-9 of the largest)', () => {
    const profile = generateProfile({
      kind: 'fink',
      span: 8534.4,
      pitch: 6,
      heelHeight: 0,
      overhangLeft: 0,
      overhangRight: 0,
    });
    const loads = profile.topChordJoints.map((joint) => ({ joint, fy: -3000 }));
    const truss = analyzeTruss({
      joints: profile.joints,
      members: profile.members.map((m) => ({ id: m.id, from: m.from, to: m.to })),
      supports: profile.supports,
      loads,
    });
    const frame = prepareFrame({
      joints: profile.joints,
      members: profile.members.map((m) => ({
        id: m.id,
        from: m.from,
        to: m.to,
        ...SECTION,
        releaseStart: true,
        releaseEnd: true,
      })),
      supports: profile.supports,
    });
    const r = solveFrame(frame, { joints: loads });
    const largest = Math.max(...truss.members.map((m) => Math.abs(m.force)));
    truss.members.forEach((m, k) => {
      expect(Math.abs(r.members[k].axial - m.force)).toBeLessThan(1e-9 * largest);
      expect(r.members[k].maxMoment).toBe(0);
    });
    truss.reactions.forEach((x, k) => {
      expect(r.reactions[k].ry).toBeCloseTo(x.ry, 6);
    });
  });
});
