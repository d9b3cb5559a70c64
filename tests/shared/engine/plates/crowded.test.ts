import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../../../shared/engine/errors';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import type {
  PlateCatalog,
  PlateJoint,
  PlateJointMember,
  PlateSpec,
} from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm } from '../../../../shared/engine/units';

// 1 in = 25.4 mm exactly; a 2x4 is 1½ × 3½ in dressed (NDS 2018 Supplement Table 1A).
// Exclusions ½ in from lumber ends and ¼ in from edges: common practice.
const IN = 25.4;
const IN2 = IN * IN;
const DEG = Math.PI / 180;

// Test-only plate values, round numbers for hand checks.
const plate = (width: number, length: number): PlateSpec => ({
  id: `${width}x${length}`,
  gauge: 20,
  width,
  length,
  lateralValue: { aa: 100, ea: 100, ae: 100, ee: 100 },
  tensionValue: 1000,
  shearValue: 500,
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
  angleDeg: number,
  forceLbf: number,
  depthIn = 3.5,
): PlateJointMember => ({
  id,
  role,
  direction: { x: Math.cos(angleDeg * DEG), y: Math.sin(angleDeg * DEG) },
  depth: mm(depthIn * IN),
  force: lbfToN(lbf(forceLbf)),
});
const areaOf = (r: ReturnType<typeof designJointPlate>, id: string) =>
  r.members.find((m) => m.member === id)!.area / IN2;

describe('three webs on a continuous chord, hand-computed', () => {
  // A 2x4 bottom chord runs straight through the joint (L to the left, R to the right); three
  // 2x4 webs leave it at 135°, 90° and 45°. Plate 10 in across the chord, 8 in along it,
  // centred (light forces, so the first placement fits). Frame: u along the chord, v up.
  const joint: PlateJoint = {
    id: 'P',
    x: 0,
    y: 0,
    members: [
      member('L', 'bottomChord', 180, 100),
      member('R', 'bottomChord', 0, 100),
      member('W1', 'web', 135, 50),
      member('W2', 'web', 90, 50),
      member('W3', 'web', 45, 50),
    ],
  };
  const r = designJointPlate(joint, catalogOf(plate(10, 8)));

  it('keeps the whole chord band on each side of the joint', () => {
    // Webs stop at a chord that runs through: each side is (4 − ½) in long, 3½ − 2·¼ = 3 in wide.
    expect(r.offset).toBe(0);
    expect(areaOf(r, 'L')).toBeWithin(3.5 * 3, { rel: 1e-9 });
    expect(areaOf(r, 'R')).toBeWithin(3.5 * 3, { rel: 1e-9 });
  });

  it('gives the middle web its band above the chord, mitred with both neighbours', () => {
    // W2's band: |u| ≤ 1½ (edges), v ≥ 1¾ + ½ = 2¼ (the chord's face plus the end margin), up to
    // the plate edge v = 5. The mitre with W3 is the 67.5° bisector moved ½ in toward W2:
    // v ≥ v0 + k|u| with k = tan 67.5° = 1 + √2 and v0 = ½ / sin 22.5°; the same with W1.
    // That line meets v = 2¼ at u1 = (2¼ − v0)/k. Per half (u ≥ 0):
    //   ∫₀^1.5 (5 − max(2¼, v0 + k u)) du = 7.5 − 2¼·u1 − [v0 (1.5 − u1) + k/2 (1.5² − u1²)].
    const k = 1 + Math.SQRT2;
    const v0 = 0.5 / Math.sin(22.5 * DEG);
    const u1 = (2.25 - v0) / k;
    const half = 7.5 - 2.25 * u1 - (v0 * (1.5 - u1) + (k / 2) * (1.5 * 1.5 - u1 * u1));
    expect(areaOf(r, 'W2')).toBeWithin(2 * half, { rel: 1e-9 }); // ≈ 5.280 in²
  });

  it('treats the two outer webs alike (mirror geometry)', () => {
    expect(areaOf(r, 'W1')).toBeWithin(areaOf(r, 'W3'), { rel: 1e-9 });
    expect(areaOf(r, 'W1')).toBeGreaterThan(0);
  });
});

describe('a web meeting a chord that ends at the joint at a shallow angle', () => {
  // A 2x4 chord C ends at the joint and runs along +u; a 2x4 web leaves at 30° (no force: only
  // the chord's area is checked here). Plate 4 in across, 8 in along the chord.
  const web = member('W', 'web', 30, 0);

  it('shares their overlap on the 15° bisector (a mitre)', () => {
    const r = designJointPlate(
      { id: 'M', x: 0, y: 0, members: [member('C', 'bottomChord', 0, 100), web] },
      catalogOf(plate(4, 8)),
    );
    // The chord keeps v ≤ u·tan 15° − ½ / cos 15° (the bisector moved ½ in back) within its
    // band v ≥ −1½, for u from ½ to 4 (the plate's end); the line stays inside the band there:
    //   ∫ (u tan15° − ½/cos15° + 1½) du = tan15°/2 (4² − ½²) + (1½ − ½/cos15°)(4 − ½).
    const t = Math.tan(15 * DEG);
    const e = 0.5 / Math.cos(15 * DEG);
    expect(areaOf(r, 'C')).toBeWithin((t / 2) * (16 - 0.25) + (1.5 - e) * 3.5, { rel: 1e-9 });
  });

  it('still butts a chord that runs through the joint, which keeps its full band', () => {
    const r = designJointPlate(
      {
        id: 'T',
        x: 0,
        y: 0,
        members: [member('C', 'bottomChord', 0, 100), member('D', 'bottomChord', 180, 100), web],
      },
      catalogOf(plate(4, 8)),
    );
    expect(areaOf(r, 'C')).toBeWithin(3.5 * 3, { rel: 1e-9 });
  });
});

describe('larger plates always help', () => {
  // Random joints: a chord that ends or runs through, or two chords meeting at an angle, and one
  // to three webs of random depth and angle above it.
  const jointArb = fc.record({
    through: fc.constantFrom('ends', 'through', 'bent'),
    bend: fc.double({ min: 5, max: 40, noNaN: true }),
    webs: fc.array(
      fc.record({
        angle: fc.double({ min: 10, max: 170, noNaN: true }),
        depth: fc.constantFrom(3.5, 5.5),
        force: fc.double({ min: 10, max: 3000, noNaN: true }),
      }),
      { minLength: 1, maxLength: 3 },
    ),
    chordForce: fc.double({ min: 10, max: 4000, noNaN: true }),
  });
  type JointCase = typeof jointArb extends fc.Arbitrary<infer T> ? T : never;
  const sizes = fc.record({
    w: fc.integer({ min: 3, max: 10 }),
    l: fc.integer({ min: 4, max: 14 }),
    dw: fc.integer({ min: 0, max: 4 }),
    dl: fc.integer({ min: 0, max: 4 }),
  });
  const build = (j: JointCase, scale: number): PlateJoint => {
    const chords =
      j.through === 'ends'
        ? [member('C1', 'bottomChord', 0, j.chordForce * scale)]
        : j.through === 'through'
          ? [
              member('C1', 'bottomChord', 0, j.chordForce * scale),
              member('C2', 'bottomChord', 180, j.chordForce * scale),
            ]
          : [
              member('C1', 'bottomChord', -j.bend, j.chordForce * scale),
              member('C2', 'bottomChord', 180 + j.bend, j.chordForce * scale),
            ];
    const webs = j.webs.map((w, i) => member(`W${i}`, 'web', w.angle, w.force * scale, w.depth));
    return { id: 'J', x: 0, y: 0, members: [...chords, ...webs] };
  };
  const fits = (joint: PlateJoint, p: PlateSpec) => {
    try {
      return designJointPlate(joint, catalogOf(p));
    } catch (e) {
      if (isEngineError(e) && e.code === 'no_plate_fits') return undefined;
      throw e;
    }
  };

  it('a larger plate at the same placement never gives a member less area', () => {
    fc.assert(
      fc.property(jointArb, sizes, (j, s) => {
        // No forces: every plate fits centred on the joint, and reports each member's area.
        const joint = build(j, 0);
        const small = fits(joint, plate(s.w, s.l))!;
        const large = fits(joint, plate(s.w + s.dw, s.l + s.dl))!;
        expect(small.offset).toBe(0);
        expect(large.offset).toBe(0);
        for (const m of small.members) {
          const bigger = large.members.find((x) => x.member === m.member)!;
          expect(bigger.area).toBeGreaterThanOrEqual(m.area - 1e-9);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('a joint a plate fits is fitted by every plate that contains it', () => {
    fc.assert(
      fc.property(jointArb, sizes, (j, s) => {
        const joint = build(j, 0.05);
        const small = fits(joint, plate(s.w, s.l));
        fc.pre(small !== undefined);
        expect(fits(joint, plate(s.w + s.dw, s.l + s.dl))).toBeDefined();
      }),
      { numRuns: 200 },
    );
  });
});
