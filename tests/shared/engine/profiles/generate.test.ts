import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../../../shared/engine/errors';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import type {
  ProfileKind,
  ProfileParams,
  TrussProfile,
} from '../../../../shared/engine/profiles/types';

const FT = 304.8;
const IN = 25.4;
const PITCHED: ProfileKind[] = [
  'kingPost',
  'queenPost',
  'fink',
  'howe',
  'fan',
  'doubleFink',
  'scissor',
  'mono',
];
const SYMMETRIC = PITCHED.filter((k) => k !== 'mono');

const base = (kind: ProfileKind, over: Partial<ProfileParams> = {}): ProfileParams => ({
  kind,
  span: 28 * FT,
  pitch: 6,
  heelHeight: 0,
  overhangLeft: 18 * IN,
  overhangRight: 18 * IN,
  bottomPitch: kind === 'scissor' ? 3 : undefined,
  depth: kind === 'flat' ? 36 * IN : undefined,
  panels: kind === 'flat' ? 8 : undefined,
  ...over,
});

/**
 * Method-of-joints equilibrium matrix, 2j × (m + r): a column per member (unit vector, tension
 * positive) and per reaction component. Built here so the test does not lean on the analysis
 * module (statics, any textbook: a plane truss is determinate and stable when m + r = 2j and
 * this matrix has full rank).
 */
const equilibriumMatrix = (p: TrussProfile): Matrix => {
  const index = new Map(p.joints.map((j, i) => [j.id, i]));
  const r = p.supports.reduce((n, s) => n + (s.type === 'pin' ? 2 : 1), 0);
  const a = Matrix.zeros(2 * p.joints.length, p.members.length + r);
  p.members.forEach((m, c) => {
    const i = index.get(m.from) as number;
    const k = index.get(m.to) as number;
    const ux = (p.joints[k].x - p.joints[i].x) / m.length;
    const uy = (p.joints[k].y - p.joints[i].y) / m.length;
    a.set(2 * i, c, ux);
    a.set(2 * i + 1, c, uy);
    a.set(2 * k, c, -ux);
    a.set(2 * k + 1, c, -uy);
  });
  let c = p.members.length;
  for (const s of p.supports) {
    const i = index.get(s.joint) as number;
    if (s.type === 'pin') {
      a.set(2 * i, c++, 1);
      a.set(2 * i + 1, c++, 1);
    } else {
      a.set(2 * i + (s.normal === 'x' ? 0 : 1), c++, 1);
    }
  }
  return a;
};

const expectDeterminateAndStable = (p: TrussProfile): void => {
  const r = p.supports.reduce((n, s) => n + (s.type === 'pin' ? 2 : 1), 0);
  expect(r).toBe(3);
  expect(p.members.length + r).toBe(2 * p.joints.length);
  const svd = new SingularValueDecomposition(equilibriumMatrix(p), { autoTranspose: true });
  expect(svd.rank).toBe(2 * p.joints.length);
};

/** Generates, or returns undefined when the input is refused as unbuildable geometry. */
const tryGenerate = (params: ProfileParams): TrussProfile | undefined => {
  try {
    return generateProfile(params);
  } catch (e) {
    if (isEngineError(e) && e.code === 'geometry') return undefined;
    throw e;
  }
};

describe('generateProfile: determinate, stable plane trusses', () => {
  const spans = [4, 6, 8, 12, 16, 20, 24, 28, 32, 40, 50, 60, 80].map((f) => f * FT);
  const pitches = [2, 3, 4, 6, 8, 10, 12, 16];
  const heels = [0, 6 * IN, 12 * IN, 24 * IN, 48 * IN];

  it.each(PITCHED)('%s over a sweep of spans, pitches and heels', (kind) => {
    let built = 0;
    for (const span of spans) {
      for (const pitch of pitches) {
        for (const heelHeight of heels) {
          const bottomPitches = kind === 'scissor' ? [0, pitch / 2 - 1, pitch / 2] : [undefined];
          for (const bottomPitch of bottomPitches) {
            if (bottomPitch !== undefined && (bottomPitch < 0 || bottomPitch >= pitch - 2))
              continue;
            const p = tryGenerate(base(kind, { span, pitch, heelHeight, bottomPitch }));
            if (!p) continue;
            built++;
            expectDeterminateAndStable(p);
          }
        }
      }
    }
    // Most of the sweep is buildable; the rest is refused (short webs, panels over stock).
    expect(built).toBeGreaterThan(80);
  });

  it('flat over a sweep of spans, depths and panel counts', () => {
    let built = 0;
    for (const span of [4, 8, 16, 24, 40, 60].map((f) => f * FT)) {
      for (const depth of [6 * IN, 12 * IN, 24 * IN, 48 * IN, 72 * IN]) {
        for (const panels of [2, 4, 6, 8, 12, 20, 40]) {
          const p = tryGenerate(base('flat', { span, depth, panels }));
          if (!p) continue;
          built++;
          expectDeterminateAndStable(p);
        }
      }
    }
    expect(built).toBeGreaterThan(60);
    // An SVD per profile: seconds on a busy 2-core machine, so more than the default 5 s.
  }, 60_000);
});

describe('generateProfile: geometry', () => {
  const heels = [0, 12 * IN];

  it.each(SYMMETRIC)('%s joints mirror about mid-span', (kind) => {
    for (const heelHeight of heels) {
      const p = generateProfile(base(kind, { heelHeight }));
      const L = p.params.span;
      for (const j of p.joints) {
        const mirror = p.joints.find(
          (k) => Math.abs(k.x - (L - j.x)) < 1e-6 && Math.abs(k.y - j.y) < 1e-6,
        );
        expect(mirror, `mirror of ${j.id}`).toBeDefined();
      }
    }
  });

  it('flat joints mirror about mid-span', () => {
    const p = generateProfile(base('flat'));
    for (const j of p.joints) {
      expect(
        p.joints.some((k) => Math.abs(k.x - (p.params.span - j.x)) < 1e-6 && k.y === j.y),
      ).toBe(true);
    }
  });

  // Rise of a pitched roof = run × pitch / 12 (definition of pitch, common practice) plus the heel.
  it.each(SYMMETRIC)('%s peak height = span/2 × pitch/12 + heel', (kind) => {
    for (const heelHeight of heels) {
      const p = generateProfile(base(kind, { heelHeight }));
      const expected = (p.params.span / 2) * (p.params.pitch / 12) + heelHeight;
      expect(Math.max(...p.joints.map((j) => j.y))).toBeWithin(expected, { rel: 1e-12 });
      expect(p.rise).toBeWithin(expected, { rel: 1e-12 });
    }
  });

  it('mono tall end = span × pitch/12 + heel, at x = span', () => {
    const p = generateProfile(base('mono', { span: 16 * FT, pitch: 4, heelHeight: 10 * IN }));
    const expected = 16 * FT * (4 / 12) + 10 * IN;
    const tall = p.joints.find((j) => j.id === p.topChordJoints[p.topChordJoints.length - 1]);
    expect(tall?.x).toBeWithin(16 * FT);
    expect(tall?.y).toBeWithin(expected, { rel: 1e-12 });
    expect(p.rise).toBeWithin(expected, { rel: 1e-12 });
  });

  it.each([...PITCHED, 'flat' as const])('%s member lengths by Pythagoras', (kind) => {
    const p = generateProfile(base(kind, { heelHeight: 12 * IN }));
    const at = new Map(p.joints.map((j) => [j.id, j]));
    for (const m of p.members) {
      const a = at.get(m.from)!;
      const b = at.get(m.to)!;
      expect(m.length).toBeWithin(Math.sqrt((b.x - a.x) ** 2 + (b.y - a.y) ** 2), { rel: 1e-12 });
    }
  });

  it('bearings on y = 0 at x = 0 and span; pin left, roller (normal y) right', () => {
    for (const kind of [...PITCHED, 'flat' as const]) {
      const p = generateProfile(base(kind));
      const [left, right] = [p.bottomChordJoints[0], p.bottomChordJoints.at(-1)];
      expect(p.supports).toEqual([
        { joint: left, type: 'pin' },
        { joint: right, type: 'roller', normal: 'y' },
      ]);
      const jl = p.joints.find((j) => j.id === left)!;
      const jr = p.joints.find((j) => j.id === right)!;
      expect([jl.x, jl.y, jr.y]).toEqual([0, 0, 0]);
      expect(jr.x).toBeWithin(p.params.span);
    }
  });

  it('pointed heel: chords meet at the bearing; raised heel: a heel post of heelHeight', () => {
    const pointed = generateProfile(base('fink'));
    expect(pointed.topChordJoints[0]).toBe(pointed.bottomChordJoints[0]);
    expect(pointed.topChordJoints.at(-1)).toBe(pointed.bottomChordJoints.at(-1));

    const raised = generateProfile(base('fink', { heelHeight: 10 * IN }));
    const heelTop = raised.topChordJoints[0];
    const post = raised.members.find((m) => m.from === 'A' && m.to === heelTop);
    expect(post?.role).toBe('web');
    expect(post?.length).toBeWithin(10 * IN);
  });

  it('scissor bottom chord rises at bottomPitch to mid-span', () => {
    const p = generateProfile(base('scissor', { span: 32 * FT, pitch: 6, bottomPitch: 3 }));
    const mid = p.joints.find((j) => Math.abs(j.x - 16 * FT) < 1e-6 && j.y < 2 * FT * 3);
    expect(mid?.y).toBeWithin(16 * FT * (3 / 12));
    expect(p.bottomChordJoints).toContain(mid?.id);
  });
});

describe('generateProfile: pieces and overhangs', () => {
  it.each([...PITCHED, 'flat' as const])('%s piece lengths add up', (kind) => {
    const p = generateProfile(
      base(kind, { heelHeight: 12 * IN, overhangLeft: 12 * IN, overhangRight: 24 * IN }),
    );
    const sum = (xs: number[]) => xs.reduce((s, x) => s + x, 0);
    const overhang = sum(p.overhangs.map((o) => o.slopeLength));
    for (const role of ['topChord', 'bottomChord', 'web'] as const) {
      const members = sum(p.members.filter((m) => m.role === role).map((m) => m.length));
      const pieces = sum(p.pieces.filter((x) => x.role === role).map((x) => x.length));
      expect(pieces).toBeWithin(members + (role === 'topChord' ? overhang : 0), { rel: 1e-12 });
    }
    // Every member sits in exactly one piece; each web is its own piece.
    const carried = p.pieces.flatMap((x) => x.members).sort();
    expect(carried).toEqual(p.members.map((m) => m.id).sort());
    expect(p.pieces.filter((x) => x.role === 'web').every((x) => x.members.length === 1)).toBe(
      true,
    );
  });

  // Slope length = horizontal × √(1 + (pitch/12)²), Pythagoras on the roof slope.
  it('overhangs continue the end top-chord members at the roof slope', () => {
    const p = generateProfile(base('fink', { pitch: 5, overhangLeft: 24 * IN, overhangRight: 0 }));
    expect(p.overhangs).toHaveLength(1);
    const [o] = p.overhangs;
    expect(o).toMatchObject({
      side: 'left',
      heelJoint: 'A',
      horizontal: 24 * IN,
      member: p.members[0].id,
    });
    expect(o.slopeLength).toBeWithin(24 * IN * Math.sqrt(1 + (5 / 12) ** 2), { rel: 1e-12 });
    expect(p.members.some((m) => m.from === 'A' && p.topChordJoints.includes(m.to))).toBe(true);
  });

  it('each top chord of a gable is one piece heel to peak, plus its overhang', () => {
    const p = generateProfile(base('howe', { span: 24 * FT, pitch: 4 }));
    const tc = p.pieces.filter((x) => x.role === 'topChord');
    expect(tc.map((x) => x.id)).toEqual(['TC1', 'TC2']);
    expect(tc[0].members).toHaveLength(2);
    expect(tc.every((x) => x.spliceAt === undefined)).toBe(true);
  });

  it('a chord longer than the stock gets a splice at the panel point nearest the middle', () => {
    // 24 ft bottom chord > 20 ft stock: Fink third-points at 8 ft and 16 ft, both 4 ft from the middle.
    const p = generateProfile(base('fink', { span: 24 * FT, pitch: 4 }));
    const bc = p.pieces.filter((x) => x.role === 'bottomChord');
    expect(bc.map((x) => x.id)).toEqual(['BC1', 'BC2']);
    expect(bc[0].spliceAt).toEqual(['B']);
    expect(bc[1].spliceAt).toEqual(['B']);
    expect(bc.every((x) => x.length <= 6096)).toBe(true);

    // Double Fink, 28 ft: fifth-points; the middle panel point at 11.2 ft or 16.8 ft fits both parts.
    const d = generateProfile(base('doubleFink', { span: 28 * FT, pitch: 6 }));
    const dbc = d.pieces.filter((x) => x.role === 'bottomChord');
    expect(dbc).toHaveLength(2);
    expect(dbc.every((x) => x.length <= 6096)).toBe(true);
    expect(dbc[0].spliceAt).toEqual([d.bottomChordJoints[2]]);
  });

  it('a chord no single splice can fit is spliced again', () => {
    // 40 ft Fink bottom chord, third-points 13.3 ft apart: needs two splices for 20 ft stock.
    const p = generateProfile(base('fink', { span: 40 * FT, pitch: 6 }));
    const bc = p.pieces.filter((x) => x.role === 'bottomChord');
    expect(bc.map((x) => x.members.length)).toEqual([1, 1, 1]);
    expect(bc[1].spliceAt).toEqual(['B', 'C']);
  });

  it('a longer stock length removes the splice', () => {
    const p = generateProfile(base('fink', { span: 24 * FT, pitch: 4, maxStockLength: 24 * FT }));
    expect(p.pieces.filter((x) => x.role === 'bottomChord')).toHaveLength(1);
    expect(p.params.maxStockLength).toBe(24 * FT);
  });
});

describe('generateProfile: web layouts', () => {
  // Web and panel counts of each layout as documented in its file (common practice layouts).
  it.each<[ProfileKind, number, number, number]>([
    ['kingPost', 1, 2, 2],
    ['queenPost', 4, 4, 3],
    ['fink', 4, 4, 3],
    ['howe', 5, 4, 4],
    ['fan', 6, 6, 3],
    ['doubleFink', 8, 6, 5],
    ['scissor', 5, 4, 4],
    ['mono', 4, 3, 2],
  ])(
    '%s: %i webs, %i top-chord and %i bottom-chord panels (pointed heel)',
    (kind, webs, tc, bc) => {
      const p = generateProfile(base(kind, { heelHeight: 0 }));
      const count = (role: string) => p.members.filter((m) => m.role === role).length;
      expect([count('web'), count('topChord'), count('bottomChord')]).toEqual([webs, tc, bc]);
      // A raised heel adds a heel post, a heel web and a web closing the end panel at each heel
      // (mono: at the low heel).
      const raised = generateProfile(base(kind, { heelHeight: 12 * IN }));
      const extra = kind === 'mono' ? 3 : 6;
      expect(raised.members.filter((m) => m.role === 'web').length).toBe(webs + extra);
    },
  );

  // Its speed is measured by `npm run bench` (profile generation line), not asserted here.
});
