import { describe, expect, it } from 'vitest';
import {
  plyFastening,
  type FasteningCombination,
} from '../../../../shared/engine/design/plyFastening';
import type { EnginePointLoad } from '../../../../shared/engine/design/pointLoads';
import { generateProfile } from '../../../../shared/engine/profiles';
import { mm, newton } from '../../../../shared/engine/units';
import { engineInput } from './support/inputs';

/**
 * Ply-to-ply fastening of a 2-ply girder by hand (as in girder.test.ts): a hung load bears on
 * one ply and (n − 1)/n of it passes to the other, spread over the chord half-way to its
 * neighbours and at most 12 in. either side (common practice). 10d common nail in S-P-F
 * (G = 0.42, NDS 2018 Table 12.3.3A, from memory): Fe = 16,600·G^1.84, mode IV with KD = 2.2
 * (NDS 2018 Eq. 12.3-6) → Z = 100.0 lb; 3 rows in a 2x6; Z′ = Z·CD. Units lb, in.
 */
const N_PER_LB = 4.4482216152605;
const FE = 16600 * 0.42 ** 1.84;
const Z = (0.148 ** 2 / 2.2) * Math.sqrt((2 * FE * 90000) / (3 * 2));

const setup = () => {
  const input = engineInput({
    units: 'imperial',
    profile: 'fink',
    span: 28 * 12,
    pitch: 4,
    spacing: 24,
    plies: 2,
    loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
  });
  const profile = generateProfile({ ...input.profile, heelHeight: 0 });
  const lumber = profile.members.map((m) =>
    m.role === 'bottomChord' ? '2x6 SPF-1/2' : '2x4 SPF-1/2',
  );
  return { profile, lumber };
};
const hung = (xIn: number, deadLb: number, liveLb: number, kind: EnginePointLoad['kind']) =>
  ({
    x: mm(xIn * 25.4),
    chord: 'bottom',
    dead: newton(deadLb * N_PER_LB),
    live: newton(liveLb * N_PER_LB),
    kind,
  }) as EnginePointLoad;
const COMBOS: FasteningCombination[] = [
  { name: 'D', cd: 0.9, terms: [['D', 1]] },
  {
    name: 'D + Lr',
    cd: 1.25,
    terms: [
      ['D', 1],
      ['Lr', 1],
    ],
  },
];
/** N/mm → lb/ft. */
const lbPerFt = (q: number) => (q * 304.8) / N_PER_LB;

describe('2-ply girder fastening with two hung loads 12 in. apart', () => {
  it('each load spreads 12 in. outward and 6 in. toward the other: 18 in. of chord', () => {
    expect(Z).toBeCloseTo(100.0, 1);
    const { profile, lumber } = setup();
    const loads = [hung(112, 1000, 1500, 'Lr'), hung(100, 500, 500, 'Lr')];
    const all = plyFastening(profile, lumber, 2, loads, COMBOS);
    const [bottom] = all.filter((c) => c.chord === 'bottom');
    // In any order: the loads are sorted along the chord.
    expect(plyFastening(profile, lumber, 2, [...loads].reverse(), COMBOS)).toEqual(all);
    // D + Lr on the second load: ½ × 2500 lb over 18 in. = 69.44 lb/in. = 833.3 lb/ft; at CD 1.25
    // it governs D alone (½ × 1000 / 18 / 0.9 = 30.9 lb/in. per unit CD, against 55.6).
    const q = (0.5 * 2500) / 18;
    expect(lbPerFt(bottom.demand)).toBeWithin(q * 12, { rel: 1e-9 });
    expect(bottom.combination).toBe('D + Lr');
    expect(bottom.cd).toBe(1.25);
    // Spacing: 3 rows × Z × 1.25 / 69.44 lb/in. = 5.4 in. → 5 in.
    const s = Math.floor((3 * Z * 1.25) / q);
    expect(s).toBe(5);
    expect(bottom.spacing / 25.4).toBeCloseTo(5, 9);
    expect(bottom.rows).toBe(3);
    expect(bottom.fastener).toBe('nail10d');
    expect(lbPerFt(bottom.capacity)).toBeWithin(((3 * Z * 1.25) / 5) * 12, { rel: 1e-3 });
    expect(bottom.ratio).toBeWithin(q / ((3 * Z * 1.25) / 5), { rel: 1e-3 });
    expect(bottom.pass).toBe(true);
    expect(bottom.text).toBe(
      `Bottom chord, 2-ply: 10d common nails (0.148 × 3 in.) in 3 rows at 5 in. o.c. from one face — ` +
        `carries 833 lb/ft from the loaded ply (D + Lr), capacity ${Math.round(lbPerFt(bottom.capacity))} lb/ft ` +
        `(Z = 100 lb × CD 1.25, NDS 2018 Table 12N, mode IV).`,
    );
    // The 2x4 top chord (3.5 in.) has room for 2 rows; no loads hang on it: the largest spacing.
    const [top] = all.filter((c) => c.chord === 'top');
    expect(top.text).toBe(
      'Top chord, 2-ply: 10d common nails (0.148 × 3 in.) in 2 rows at 12 in. o.c. from one face (no point loads on this chord: the largest spacing).',
    );
    expect(top.combination).toBe('no point loads');
    expect(top.demand).toBe(0);
  });

  it('rows by chord depth (common practice): nails 2/3/4 in a 2x4/2x6/2x8, bolts 1 below 7 in., else 2', () => {
    const { profile } = setup();
    const rowsOf = (bottom: string, deadLb: number) =>
      plyFastening(
        profile,
        profile.members.map((m) => (m.role === 'bottomChord' ? bottom : '2x4 SPF-1/2')),
        2,
        [hung(100, deadLb, 0, 'Lr')],
        COMBOS,
      ).find((c) => c.chord === 'bottom')!;
    expect(rowsOf('2x4 SPF-1/2', 100).rows).toBe(2);
    expect(rowsOf('2x6 SPF-1/2', 100).rows).toBe(3);
    expect(rowsOf('2x8 SPF-1/2', 100).rows).toBe(4);
    expect(rowsOf('2x8 SPF-1/2', 100).text).toMatch(/in 4 rows at/);
    // 8000 lb hung: nails would need less than 3 in.; 1/2 in. bolts through both plies.
    const bolted6 = rowsOf('2x6 SPF-1/2', 8000);
    expect(bolted6).toMatchObject({ fastener: 'bolt12', rows: 1, faces: 'through all plies' });
    expect(bolted6.text).toMatch(/in 1 row at/);
    expect(rowsOf('2x8 SPF-1/2', 8000)).toMatchObject({ fastener: 'bolt12', rows: 2 });
  });

  it('a snow load counts in the unbalanced snow combinations too', () => {
    const { profile, lumber } = setup();
    const unbalanced = (side: 'L' | 'R'): FasteningCombination[] => [
      {
        name: `D + S[unbal. ${side}]`,
        cd: 1.15,
        terms: [
          ['D', 1],
          [`Su${side}`, 1],
        ],
      },
    ];
    const combos = unbalanced('L');
    const [right] = plyFastening(
      profile,
      lumber,
      2,
      [hung(100, 200, 800, 'S')],
      unbalanced('R'),
    ).filter((c) => c.chord === 'bottom');
    expect(lbPerFt(right.demand)).toBeWithin(250, { rel: 1e-9 });
    // Snow is not roof live: in D + Lr only its dead load passes (½ × 200 / 24 in. = 50 lb/ft).
    const [lrCombo] = plyFastening(profile, lumber, 2, [hung(100, 200, 800, 'S')], COMBOS).filter(
      (c) => c.chord === 'bottom',
    );
    expect(lbPerFt(lrCombo.demand)).toBeWithin(50, { rel: 1e-9 });
    const [bottom] = plyFastening(profile, lumber, 2, [hung(100, 200, 800, 'S')], combos).filter(
      (c) => c.chord === 'bottom',
    );
    // ½ × 1000 lb over 24 in. (12 in. each side) = 20.83 lb/in. = 250 lb/ft.
    expect(lbPerFt(bottom.demand)).toBeWithin(250, { rel: 1e-9 });
    expect(bottom.combination).toBe('D + S[unbal. L]');
    // A roof live load is not snow: it is not in that combination.
    const [lr] = plyFastening(profile, lumber, 2, [hung(100, 200, 800, 'Lr')], combos).filter(
      (c) => c.chord === 'bottom',
    );
    expect(lbPerFt(lr.demand)).toBeWithin(50, { rel: 1e-9 });
  });

  it('a load 6 in. from the heel spreads 6 in. toward it (the chord ends there)', () => {
    const { profile, lumber } = setup();
    const [bottom] = plyFastening(profile, lumber, 2, [hung(6, 0, 360, 'Lr')], COMBOS).filter(
      (c) => c.chord === 'bottom',
    );
    // ½ × 360 lb over 6 + 12 = 18 in. = 10 lb/in. = 120 lb/ft.
    expect(lbPerFt(bottom.demand)).toBeWithin(120, { rel: 1e-9 });
    const [end] = plyFastening(
      profile,
      lumber,
      2,
      [hung(28 * 12 - 6, 0, 360, 'Lr')],
      COMBOS,
    ).filter((c) => c.chord === 'bottom');
    expect(lbPerFt(end.demand)).toBeWithin(120, { rel: 1e-9 });
  });

  it('a single-ply truss needs none', () => {
    const { profile, lumber } = setup();
    expect(plyFastening(profile, lumber, 1, [hung(100, 1000, 0, 'Lr')], COMBOS)).toEqual([]);
  });
});
