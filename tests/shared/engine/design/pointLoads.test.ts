import { describe, expect, it } from 'vitest';
import { designInputSchema } from '../../../../shared/api/design';
import { designTruss } from '../../../../shared/engine/design';
import { placePointLoad } from '../../../../shared/engine/design/pointLoads';
import { prepareFrame, solveFrame } from '../../../../shared/engine/frame';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';
import { engineInput, fink28 } from './support/inputs';

const N_PER_LB = 4.4482216152605;

// fink28: panel points at 0, 7, 9.33, 14, … ft.

describe('point loads: placement and statics', () => {
  it('lands on a panel point as a joint load and between panel points on the chord member', () => {
    const p = generateProfile(engineInput(fink28()).profile);
    const b = p.joints.find((j) => j.id === p.bottomChordJoints[1])!;
    expect(placePointLoad(p, 'bottom', b.x)).toEqual({ joint: b.id });
    const inside = placePointLoad(p, 'bottom', b.x + 100);
    expect(inside).toMatchObject({ at: expect.closeTo(100, 6) });
    // On the sloped top chord the position along the member is the run over cos θ.
    const top = placePointLoad(p, 'top', 600);
    const cos = 12 / Math.hypot(12, 6);
    expect(top).toMatchObject({ at: expect.closeTo(600 / cos, 6) });
    expect(() => placePointLoad(p, 'bottom', -50)).toThrow(/not on the bottom chord/);
  });

  it('reactions follow the lever rule: R = P·(L − x)/L and P·x/L (statics of a simple span)', () => {
    const P = 1000;
    const x = 10 * 12;
    for (const chord of ['top', 'bottom'] as const) {
      const d = designTruss(
        engineInput(fink28({ pointLoads: [{ x, chord, dead: P, live: 0, kind: 'roofLive' }] })),
      );
      const i = d.combinations.findIndex((c) => c.name === 'D');
      const [left, right] = d.reactions.map((r) => r.vertical[i] / N_PER_LB);
      expect(left).toBeCloseTo((P * (28 * 12 - x)) / (28 * 12), 6);
      expect(right).toBeCloseTo((P * x) / (28 * 12), 6);
    }
  });

  it('live point loads enter the combinations of their case, with its CD', () => {
    const draft = fink28({
      loads: { tcll: 0, tcdl: 0, bcll: 0, bcdl: 0, snow: { pg: 30 } },
      pointLoads: [
        { x: 100, chord: 'bottom', dead: 200, live: 1000, kind: 'snow' },
        { x: 200, chord: 'bottom', dead: 0, live: 500, kind: 'floor' },
      ],
    });
    const withLoads = designTruss(engineInput(draft));
    const without = designTruss(engineInput({ ...draft, pointLoads: [] }));
    const total = (d: typeof withLoads, name: string) => {
      const i = d.combinations.findIndex((c) => c.name === name);
      expect(i, name).toBeGreaterThanOrEqual(0);
      return d.reactions.reduce((s, r) => s + r.vertical[i], 0) / N_PER_LB;
    };
    // ASCE 7-16 §2.4.1: D + S, D + L, D + 0.75L + 0.75S; the unbalanced snow cases take the
    // snow point load whole in place of S.
    expect(total(withLoads, 'D + S') - total(without, 'D + S')).toBeCloseTo(1200, 6);
    expect(total(withLoads, 'D + L')).toBeCloseTo(200 + 500, 6);
    expect(total(withLoads, 'D + 0.75L + 0.75S') - total(without, 'D + 0.75S')).toBeCloseTo(
      200 + 0.75 * 500 + 0.75 * 1000,
      6,
    );
    const unbalanced = withLoads.combinations.find((c) => c.name.includes('unbal'))!;
    expect(total(withLoads, unbalanced.name) - total(without, unbalanced.name)).toBeCloseTo(
      1200,
      6,
    );
    // NDS 2018 Table 2.3.2: snow two months, CD 1.15; occupancy live ten years, CD 1.0.
    expect(withLoads.combinations.find((c) => c.name === 'D + S')!.cd).toBe(1.15);
    expect(withLoads.combinations.find((c) => c.name === 'D + L')!.cd).toBe(1.0);
  });
});

describe('point loads on a continuous chord: closed forms', () => {
  it('two equal continuous spans, load P at a in one span (AISC Manual 15th ed. Table 3-23)', () => {
    // AISC Steel Construction Manual, Table 3-23, "continuous beam – two equal spans –
    // concentrated load at any point": R1 = Pb/(4L³)·[4L² − a(L + a)], R2 = Pa/(2L³)·[2L² +
    // b(L + a)], R3 = −Pab/(4L³)·(L + a), M under the load = R1·a, M over R2 = −Pab(L + a)/(4L²).
    const L = 3000;
    const a = 1100;
    const b = L - a;
    const P = 5000;
    // A bottom chord of two members on three supports, placed by the engine's own rule.
    const profile = {
      joints: [
        { id: 'J0', x: 0, y: 0 },
        { id: 'J1', x: L, y: 0 },
        { id: 'J2', x: 2 * L, y: 0 },
      ],
      members: [
        { id: 'M0', from: 'J0', to: 'J1', role: 'bottomChord', length: L },
        { id: 'M1', from: 'J1', to: 'J2', role: 'bottomChord', length: L },
      ],
      params: { span: 2 * L },
    } as unknown as TrussProfile;
    const place = placePointLoad(profile, 'bottom', a);
    expect(place).toEqual({ member: 'M0', at: a });
    const section = { e: 9650, a: 38 * 89, i: (38 * 89 ** 3) / 12 };
    const frame = prepareFrame({
      joints: profile.joints,
      members: profile.members.map((m) => ({ id: m.id, from: m.from, to: m.to, ...section })),
      supports: [
        { joint: 'J0', type: 'pin' },
        { joint: 'J1', type: 'roller' },
        { joint: 'J2', type: 'roller' },
      ],
    });
    const r = solveFrame(frame, {
      members: [{ kind: 'point', member: 'M0', at: a, fy: -P }],
    });
    const R1 = ((P * b) / (4 * L ** 3)) * (4 * L * L - a * (L + a));
    const R2 = ((P * a) / (2 * L ** 3)) * (2 * L * L + b * (L + a));
    const R3 = -((P * a * b) / (4 * L ** 3)) * (L + a);
    expect(r.reactions.map((x) => x.ry)).toEqual([
      expect.closeTo(R1, 6),
      expect.closeTo(R2, 6),
      expect.closeTo(R3, 6),
    ]);
    expect(r.members[0].spanMoment).toBeCloseTo(R1 * a, 3);
    expect(r.members[0].endMoment).toBeCloseTo((-P * a * b * (L + a)) / (4 * L * L), 3);
  });
});

describe('point loads in the request', () => {
  it('are checked in the user units and converted exactly (lb → N, kN → N)', () => {
    const bad = designInputSchema.safeParse(
      fink28({ pointLoads: [{ x: 400, chord: 'bottom', dead: 100, live: 0 }] }),
    );
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0].message).toMatch(/between the heels/);
    const neg = designInputSchema.safeParse(
      fink28({ pointLoads: [{ x: 40, chord: 'top', dead: -5, live: 0 }] }),
    );
    expect(neg.error!.issues[0].message).toMatch(/between 0 and 20,000 lb/);
    const imperial = engineInput(
      fink28({ pointLoads: [{ x: 120, chord: 'top', dead: 100, live: 250, kind: 'snow' }] }),
    );
    expect(imperial.pointLoads![0]).toMatchObject({
      x: 120 * 25.4,
      dead: 100 * N_PER_LB,
      live: 250 * N_PER_LB,
      kind: 'S',
    });
    const metric = engineInput({
      ...fink28(),
      units: 'metric',
      span: 8534,
      spacing: 610,
      pointLoads: [{ x: 3000, chord: 'bottom', dead: 2, live: 3, kind: 'floor' }],
    });
    expect(metric.pointLoads![0]).toMatchObject({ x: 3000, dead: 2000, live: 3000, kind: 'L' });
  });
});
