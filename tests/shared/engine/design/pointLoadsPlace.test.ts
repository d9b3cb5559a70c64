import { describe, expect, it } from 'vitest';
import type { CaseLoads } from '../../../../shared/engine/loads';
import type { DesignCaseId } from '../../../../shared/engine/design/combinedLoads';
import {
  addPointLoads,
  placePointLoad,
  type EnginePointLoad,
} from '../../../../shared/engine/design/pointLoads';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';
import { engineErrorOf } from '../analysis/support/errors';
import { mm, newton } from '../../../../shared/engine/units';
import { engineInput, fink28 } from './support/inputs';

/**
 * Where a point load lands, by geometry alone: a 28 ft 6/12 Fink without overhangs, bearings at
 * x = 0 and 8534.4 mm (28 ft), bottom-chord panel points at the thirds (112 in. = 2844.8 mm).
 * A load within 1 mm of a panel point is taken there (PANEL_POINT_SNAP_MM). Built inside each test
 * (README, mutation testing).
 */
const SPAN = 28 * 12 * 25.4;
const finkProfile = () => generateProfile(engineInput(fink28()).profile);
const heels = (p: TrussProfile) => {
  const byX = [...p.supports].map((s) => p.joints.find((j) => j.id === s.joint)!);
  byX.sort((a, b) => a.x - b.x);
  return byX.map((j) => j.id);
};
/** A point load in mm and N (branded as the engine's input is). */
const load = (
  extra: Partial<Record<'x' | 'dead' | 'live', number>> &
    Partial<Omit<EnginePointLoad, 'x' | 'dead' | 'live'>> = {},
): EnginePointLoad => ({
  chord: 'bottom',
  kind: 'Lr',
  ...extra,
  x: mm(extra.x ?? 1000),
  dead: newton(extra.dead ?? 100),
  live: newton(extra.live ?? 0),
});

describe('placePointLoad at the ends of the chords', () => {
  it('within 1 mm of a bearing, on either side, is the bearing joint', () => {
    const p = finkProfile();
    const [left, right] = heels(p);
    for (const x of [0, 0.5, 1, -0.9, -1])
      expect(placePointLoad(p, 'bottom', x)).toEqual({ joint: left });
    for (const x of [SPAN, SPAN - 0.5, SPAN - 1, SPAN + 0.9, SPAN + 1])
      expect(placePointLoad(p, 'bottom', x)).toEqual({ joint: right });
    expect(placePointLoad(p, 'top', 0.5)).toEqual({ joint: left });
    expect(placePointLoad(p, 'top', SPAN - 0.5)).toEqual({ joint: right });
  });

  it('beyond the bearings it refuses, saying where in inches', () => {
    const p = finkProfile();
    for (const [x, chord] of [
      [-1.5, 'bottom'],
      [SPAN + 1.5, 'top'],
    ] as const) {
      const e = engineErrorOf(() => placePointLoad(p, chord, x));
      expect(e.code).toBe('invalid');
      expect(e.details).toEqual({ x, chord });
    }
    const e = engineErrorOf(() => placePointLoad(p, 'bottom', -127));
    expect(e.message).toBe(
      'A point load at -5.0 in. from the left heel is not on the bottom chord (point loads go between the bearings, 0 to 336.0 in.).',
    );
  });

  it('between panel points: the member under x, at the run from its end (bottom chord level)', () => {
    const p = finkProfile();
    const byId = new Map(p.joints.map((j) => [j.id, j]));
    const bottom = p.members.filter((m) => m.role === 'bottomChord');
    // Every bottom-chord member: a load at 30 % of its run lands on it, 0.3·L from its start.
    for (const m of bottom) {
      const a = byId.get(m.from)!;
      const b = byId.get(m.to)!;
      const x = a.x + 0.3 * (b.x - a.x);
      const place = placePointLoad(p, 'bottom', x);
      expect(place).toMatchObject({ member: m.id });
      expect((place as { at: number }).at).toBeWithin(0.3 * m.length, { rel: 1e-9 });
    }
    // 1.5 mm past the first panel point is inside the next member, not snapped.
    const first = byId.get(p.bottomChordJoints[1])!;
    expect(placePointLoad(p, 'bottom', first.x + 1.5)).toHaveProperty('member');
    expect(placePointLoad(p, 'bottom', first.x - 1.5)).toHaveProperty('member');
    expect(placePointLoad(p, 'bottom', first.x + 0.9)).toEqual({ joint: first.id });
    expect(placePointLoad(p, 'bottom', first.x - 0.9)).toEqual({ joint: first.id });
  });
});

describe('addPointLoads into the load cases', () => {
  it('no point loads: no note and no case touched', () => {
    const cases: Partial<Record<DesignCaseId, CaseLoads>> = {};
    expect(addPointLoads(cases, finkProfile(), [])).toEqual([]);
    expect(addPointLoads(cases, finkProfile(), undefined)).toEqual([]);
    expect(cases).toEqual({});
  });

  it('dead to D and live to its own case, at a panel point as a joint load (down = −y)', () => {
    const p = finkProfile();
    const joint = p.bottomChordJoints[1];
    const x = p.joints.find((j) => j.id === joint)!.x;
    const cases: Partial<Record<DesignCaseId, CaseLoads>> = {};
    const notes = addPointLoads(cases, p, [
      load({ x, dead: 100, live: 250, kind: 'L' }),
      load({ x: 1000, dead: 0, live: 40, kind: 'Lr' }),
    ]);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/^Point loads \(2\): at a panel point as a joint load/);
    expect(cases.D).toEqual({
      jointLoads: [{ joint, fy: -100 }],
      memberLoads: [],
      overhangMoments: [],
    });
    expect(cases.L!.jointLoads).toEqual([{ joint, fy: -250 }]);
    expect(cases.L!.memberLoads).toEqual([]);
    expect(cases.L!.overhangMoments).toEqual([]);
    // A zero dead load adds nothing to D; the roof live one lands inside a member.
    expect(cases.D!.pointLoads).toBeUndefined();
    expect(cases.Lr!.jointLoads).toEqual([]);
    expect(cases.Lr!.pointLoads).toEqual([
      { member: expect.any(String), at: expect.any(Number), fy: -40 },
    ]);
  });

  it('no live load: no live case is created (so no live combinations appear)', () => {
    const cases: Partial<Record<DesignCaseId, CaseLoads>> = {};
    addPointLoads(cases, finkProfile(), [load({ live: 0, kind: 'S' })]);
    expect(Object.keys(cases)).toEqual(['D']);
  });

  it('snow goes into the unbalanced cases too, when the design has them', () => {
    const empty = (): CaseLoads => ({ jointLoads: [], memberLoads: [], overhangMoments: [] });
    const plain: Partial<Record<DesignCaseId, CaseLoads>> = {};
    addPointLoads(plain, finkProfile(), [load({ live: 300, kind: 'S' })]);
    expect(Object.keys(plain).sort()).toEqual(['D', 'S']);
    const both: Partial<Record<DesignCaseId, CaseLoads>> = { SuL: empty(), SuR: empty() };
    addPointLoads(both, finkProfile(), [load({ live: 300, kind: 'S' })]);
    for (const u of ['S', 'SuL', 'SuR'] as const)
      expect(both[u]!.pointLoads!.map((l) => l.fy)).toEqual([-300]);
  });

  it('refuses a negative or non-finite load, naming it', () => {
    for (const bad of [
      { dead: -1 },
      { live: -1 },
      { x: Number.NaN },
      { dead: Number.POSITIVE_INFINITY },
      { live: Number.NaN },
    ]) {
      const cases: Partial<Record<DesignCaseId, CaseLoads>> = {};
      const e = engineErrorOf(() =>
        addPointLoads(cases, finkProfile(), [load({ ...bad, label: 'hip girder' })]),
      );
      expect(e.code).toBe('invalid');
      expect(e.message).toBe('A point load needs a position and loads of 0 or more.');
      expect(e.details).toEqual({ load: 'hip girder' });
    }
    const e = engineErrorOf(() => addPointLoads({}, finkProfile(), [load({ dead: -1 })]));
    expect(e.details).toEqual({ load: null });
  });
});
