import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import { DEMO_PLATE_CATALOG } from '../../../../shared/engine/plates/catalog';
import type {
  PlateCatalog,
  PlateJoint,
  PlateJointMember,
  PlateSpec,
} from '../../../../shared/engine/plates/types';
import { isEngineError } from '../../../../shared/engine/errors';
import { lbfToN, lbf, mm, newton } from '../../../../shared/engine/units';

// Exact conversions (1 in = 25.4 mm; 1 lbf = 4.4482216152605 N); 2x4 is 1½ × 3½ in dressed
// (NDS 2018 Supplement Table 1A). Exclusions ½ in end, ¼ in edge: common practice.
const IN = 25.4;
const IN2 = IN * IN;
const DEPTH_2X4 = mm(3.5 * IN);

// Test-only plate values (round numbers so areas and capacities are easy to check by hand).
const plate = (width: number, length: number, over: Partial<PlateSpec> = {}): PlateSpec => ({
  id: `${width}x${length}`,
  gauge: 20,
  width,
  length,
  lateralValue: { aa: 100, ea: 100, ae: 50, ee: 50 },
  tensionValue: 1000,
  shearValue: 500,
  ...over,
});
const catalogOf = (...plates: PlateSpec[]): PlateCatalog => ({
  id: 'test',
  label: 'test values',
  demo: false,
  plates,
});

const member = (
  id: string,
  role: PlateJointMember['role'],
  x: number,
  y: number,
  forceLbf: number,
): PlateJointMember => ({
  id,
  role,
  direction: { x, y },
  depth: DEPTH_2X4,
  force: lbfToN(lbf(forceLbf)),
});

const areaOf = (r: ReturnType<typeof designJointPlate>, id: string) =>
  r.members.find((m) => m.member === id)!.area / IN2;

describe('contact areas, hand-computed', () => {
  it('straight butt splice of two 2x4 chords under a 4x8 plate', () => {
    // Each side: length 4 − ½ (end) = 3.5 in; width 3.5 − 2·¼ (edges) = 3 in → 10.5 in².
    const joint: PlateJoint = {
      id: 'S',
      x: 0,
      y: 0,
      kind: 'splice',
      members: [member('L', 'bottomChord', -1, 0, 1000), member('R', 'bottomChord', 1, 0, 1000)],
    };
    const r = designJointPlate(joint, catalogOf(plate(4, 8)));
    expect(areaOf(r, 'L')).toBeWithin(10.5, { rel: 1e-9 });
    expect(areaOf(r, 'R')).toBeWithin(10.5, { rel: 1e-9 });
    // Two faces · 10.5 in² · 100 lbf/in² = 2100 lbf.
    expect(r.members[0].capacity).toBeWithin(lbfToN(lbf(2100)), { rel: 1e-9 });
    expect(r.members[0].ratio).toBeWithin(1000 / 2100, { rel: 1e-9 });
    // Steel across the joint line: 2 plates · 1000 lbf/in · 4 in = 8000 lbf; no shear, so the
    // combined check is the tension check.
    expect(r.steel.map((s) => s.kind)).toEqual(['tension', 'shear', 'combined']);
    expect(r.steel[0].line).toBe('splice');
    expect(r.steel[0].section).toBeWithin(4 * IN, { rel: 1e-9 });
    expect(r.steel[0].capacity).toBeWithin(lbfToN(lbf(8000)), { rel: 1e-9 });
    expect(r.steel[1].demand).toBeWithin(0);
    expect(r.steel[2].ratio).toBeWithin(r.steel[0].ratio, { rel: 1e-9 });
  });

  it('right-angle T: vertical 2x4 web on a continuous 2x4 chord, 7x6 plate', () => {
    // Chord sides: (3 − ½) × 3 = 7.5 in². Web: starts ½ in above the chord's top edge (1.75 in)
    // so v ∈ [2.25, 3.5], width 3 → 3.75 in².
    const joint: PlateJoint = {
      id: 'T',
      x: 1000,
      y: 0,
      members: [
        member('BC1', 'bottomChord', -1, 0, 500),
        member('BC2', 'bottomChord', 1, 0, 500),
        member('W', 'web', 0, 1, 300),
      ],
    };
    const r = designJointPlate(joint, catalogOf(plate(7, 6)));
    expect(areaOf(r, 'BC1')).toBeWithin(7.5, { rel: 1e-9 });
    expect(areaOf(r, 'BC2')).toBeWithin(7.5, { rel: 1e-9 });
    expect(areaOf(r, 'W')).toBeWithin(3.75, { rel: 1e-9 });
    // Steel across the chord's top face: the web's 300 lbf, square to it, over the plate's 6 in
    // length: 2 · 1000 · 6 = 12 000 lbf in tension, no shear.
    const [t, v] = r.steel;
    expect(t).toMatchObject({ kind: 'tension', line: 'chordFace', member: 'W' });
    expect(t.demand).toBeWithin(lbfToN(lbf(300)), { rel: 1e-9 });
    expect(t.capacity).toBeWithin(lbfToN(lbf(12000)), { rel: 1e-9 });
    expect(v.demand).toBeWithin(0);
  });

  it('right-angle corner: chord end and web end, 5x6 plate', () => {
    // Chord: (3 − ½) × 3 = 7.5 in². Web band |u| ≤ 1.5, v ∈ [½, 2.5] less the chord band grown
    // by ½ in (u ≥ −½, |v| ≤ 2.25): 1 × 2 + 2 × 0.25 = 2.5 in².
    const joint: PlateJoint = {
      id: 'K',
      x: 0,
      y: 0,
      members: [member('BC', 'bottomChord', 1, 0, 500), member('W', 'web', 0, 1, 200)],
    };
    const r = designJointPlate(joint, catalogOf(plate(5, 6)));
    expect(areaOf(r, 'BC')).toBeWithin(7.5, { rel: 1e-9 });
    expect(areaOf(r, 'W')).toBeWithin(2.5, { rel: 1e-9 });
  });

  it('does not depend on how the joint is turned', () => {
    const turn = (a: number, x: number, y: number) => ({
      x: x * Math.cos(a) - y * Math.sin(a),
      y: x * Math.sin(a) + y * Math.cos(a),
    });
    const a = 0.4;
    const joint = (ang: number): PlateJoint => ({
      id: 'K',
      x: 0,
      y: 0,
      members: [
        { ...member('BC', 'bottomChord', 0, 0, 500), direction: turn(ang, 1, 0) },
        { ...member('W', 'web', 0, 0, 200), direction: turn(ang, 0, 1) },
      ],
    });
    const r = designJointPlate(joint(a), catalogOf(plate(5, 6)));
    expect(areaOf(r, 'W')).toBeWithin(2.5, { rel: 1e-9 });
    expect(r.angle).toBeWithin(a, { rel: 1e-12 });
  });
});

describe('heel steel', () => {
  it('splits the top-chord force along and square to the bottom chord', () => {
    // 6/12 pitch: cos θ = 12/√180, sin θ = 6/√180; section = plate length along the chord.
    const tcForce = 800;
    const joint: PlateJoint = {
      id: 'A',
      x: 0,
      y: 0,
      kind: 'heel',
      members: [member('TC', 'topChord', 12, 6, tcForce), member('BC', 'bottomChord', 1, 0, 1800)],
    };
    const r = designJointPlate(
      joint,
      catalogOf(plate(6, 10, { lateralValue: { aa: 150, ea: 150, ae: 100, ee: 100 } })),
    );
    const shear = r.steel.find((s) => s.kind === 'shear')!;
    const tension = r.steel.find((s) => s.kind === 'tension')!;
    expect(shear.section).toBeWithin(10 * IN, { rel: 1e-9 });
    expect(shear.demand).toBeWithin(lbfToN(lbf((tcForce * 12) / Math.sqrt(180))), { rel: 1e-9 });
    expect(tension.demand).toBeWithin(lbfToN(lbf((tcForce * 6) / Math.sqrt(180))), { rel: 1e-9 });
    expect(shear.capacity).toBeWithin(lbfToN(lbf(2 * 500 * 10)), { rel: 1e-9 });
  });
});

describe('plate choice', () => {
  const heel = (forceLbf: number): PlateJoint => ({
    id: 'A',
    x: 0,
    y: 0,
    kind: 'heel',
    members: [
      member('TC', 'topChord', 12, 8, forceLbf),
      member('BC', 'bottomChord', 1, 0, (forceLbf * 12) / Math.sqrt(208)),
    ],
  });
  const rank = (p: PlateSpec) =>
    [...DEMO_PLATE_CATALOG.plates]
      .sort((a, b) => a.width * a.length - b.width * b.length || b.gauge - a.gauge)
      .indexOf(p);

  it('picks the smallest plate that passes, and every check passes', () => {
    const small = designJointPlate(heel(100), catalogOf(plate(8, 12), plate(3, 4), plate(4, 6)));
    expect(small.ratio).toBeLessThanOrEqual(1);
    const big = designJointPlate(heel(1000), catalogOf(plate(8, 12), plate(3, 4), plate(4, 6)));
    expect(big.plate.id).not.toBe(small.plate.id);
    expect(big.ratio).toBeLessThanOrEqual(1);
  });

  it('prefers the lighter gauge between plates of equal size', () => {
    const r = designJointPlate(
      heel(100),
      catalogOf(plate(4, 6, { id: 'a18', gauge: 18 }), plate(4, 6, { id: 'a20', gauge: 20 })),
    );
    expect(r.plate.id).toBe('a20');
  });

  it('more force never gives a smaller plate (monotonic)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 4000, noNaN: true }),
        fc.double({ min: 1, max: 2, noNaN: true }),
        (f, k) => {
          // A joint no plate fits ranks after every plate.
          const rankFor = (force: number) => {
            try {
              return rank(designJointPlate(heel(force), DEMO_PLATE_CATALOG, { cd: 1.15 }).plate);
            } catch (e) {
              if (isEngineError(e) && e.code === 'no_plate_fits') return Infinity;
              throw e;
            }
          };
          expect(rankFor(f * k)).toBeGreaterThanOrEqual(rankFor(f));
        },
      ),
      { numRuns: 60 },
    );
  });

  it('CD scales tooth-holding capacity', () => {
    const j = heel(300);
    const c1 = designJointPlate(j, catalogOf(plate(8, 12)), { cd: 1 }).members[0].capacity;
    const c2 = designJointPlate(j, catalogOf(plate(8, 12)), { cd: 1.15 }).members[0].capacity;
    expect(c2 / c1).toBeWithin(1.15, { rel: 1e-12 });
  });

  it('throws no_plate_fits naming the joint and member', () => {
    const joint: PlateJoint = {
      id: 'C',
      x: 0,
      y: 0,
      members: [member('BC1', 'bottomChord', -1, 0, 10), member('W9', 'web', 0, 1, 1e6)],
    };
    try {
      designJointPlate(joint, DEMO_PLATE_CATALOG);
      expect.unreachable();
    } catch (e) {
      expect(isEngineError(e) && e.code).toBe('no_plate_fits');
      expect((e as Error).message).toContain('joint C');
      expect((e as Error).message).toContain('W9');
      expect((e as { details: Record<string, unknown> }).details).toMatchObject({
        joint: 'C',
        member: 'W9',
      });
    }
  });

  it('names the most loaded failing member, whatever the smaller plates tried before', () => {
    // Both webs need far more than any plate gives; the report must not depend on the search.
    const joint: PlateJoint = {
      id: 'D',
      x: 0,
      y: 0,
      members: [
        member('BC1', 'bottomChord', -1, 0, 10),
        member('BC2', 'bottomChord', 1, 0, 10),
        member('W1', 'web', 1, 1, 6000),
        member('W2', 'web', -1, 1, 8000),
      ],
    };
    const named = (catalog: PlateCatalog) => {
      try {
        designJointPlate(joint, catalog);
      } catch (e) {
        return (e as { details: { member: string } }).details.member;
      }
      return undefined;
    };
    const largest = [...DEMO_PLATE_CATALOG.plates].sort(
      (a, b) => b.width * b.length - a.width * a.length || a.gauge - b.gauge,
    )[0];
    expect(named(DEMO_PLATE_CATALOG)).toBe('W2');
    expect(named({ ...DEMO_PLATE_CATALOG, plates: [largest] })).toBe('W2');
  });

  it('names the spliced chord when the steel across the joint line is too weak', () => {
    const joint: PlateJoint = {
      id: 'S',
      x: 0,
      y: 0,
      kind: 'splice',
      members: [member('BC1', 'bottomChord', -1, 0, 900), member('BC2', 'bottomChord', 1, 0, 1000)],
    };
    // Tooth holding passes (2 · 10.5 · 100 = 2100 lbf) but the steel gives 2 · 100 · 4 = 800 lbf.
    expect(() => designJointPlate(joint, catalogOf(plate(4, 8, { tensionValue: 100 })))).toThrow(
      /joint S: BC2 \(steel tension across the splice\)/,
    );
  });

  it('rejects members without a direction or depth', () => {
    const bad: PlateJoint = {
      id: 'X',
      x: 0,
      y: 0,
      members: [{ ...member('A', 'web', 0, 0, 1), depth: mm(0), force: newton(1) }],
    };
    expect(() => designJointPlate(bad, DEMO_PLATE_CATALOG)).toThrow(/needs a depth/);
    expect(() =>
      designJointPlate({ ...bad, members: [member('A', 'web', 0, 0, 1)] }, DEMO_PLATE_CATALOG),
    ).toThrow(/needs a direction/);
  });

  // Its speed is measured by `npm run bench` (the full designs include every joint's plate).
});
