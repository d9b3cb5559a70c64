import { describe, expect, it } from 'vitest';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import type {
  PlateJoint,
  PlateJointMember,
  PlateSpec,
} from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm } from '../../../../shared/engine/units';

// Plate steel at panel points: tension, shear and the combined check (T/Tc)² + (V/Vc)² ≤ 1
// (ANSI/TPI 1-2014 joint design, from memory) across the section the member forces cross, with
// the full forces. Test-only plate values, chosen low so the steel governs (not from any
// evaluation report). 2x4 depth 3½ in (NDS 2018 Supplement Table 1A).
const IN = 25.4;
const R2 = Math.SQRT1_2;
const N = (v: number) => lbfToN(lbf(v));
const toLbf = (v: number) => v / N(1);

const plate = (width: number, length: number, tension: number, shear: number): PlateSpec => ({
  id: `${width}x${length}`,
  gauge: 20,
  width,
  length,
  lateralValue: { aa: 120, ea: 100, ae: 80, ee: 60 },
  tensionValue: tension,
  shearValue: shear,
});
const catalogOf = (p: PlateSpec) => ({ id: 't', label: 'test values', demo: false, plates: [p] });

const member = (
  id: string,
  role: PlateJointMember['role'],
  x: number,
  y: number,
  forces: number[],
): PlateJointMember => ({
  id,
  role,
  direction: { x, y },
  depth: mm(3.5 * IN),
  force: N(Math.max(...forces.map(Math.abs))),
  steelForces: forces.map(N),
});

describe("a Fink's web-to-bottom-chord joint (24 ft 4/12: webs at 45° to the peak and 135° to the top chord's quarter point)", () => {
  // Joint at x = 96 in on the bottom chord; the peak at (144, 48), the quarter point at (72, 24):
  // unit directions (1, 1)/√2 and (−1, 1)/√2. Two combinations, signed forces (tension +), lbf:
  // W1 200 / 150, W2 80 / −60.
  const joint: PlateJoint = {
    id: 'C',
    x: 96 * IN,
    y: 0,
    members: [
      member('BC1', 'bottomChord', -1, 0, [400, 300]),
      member('BC2', 'bottomChord', 1, 0, [400, 300]),
      member('W1', 'web', 48, 48, [200, 150]),
      member('W2', 'web', -24, 24, [80, -60]),
    ],
  };
  // 5x8 plate along the chord: the face line runs the plate's 8 in length. Tension 20 lbf/in,
  // shear 10 lbf/in per plate: Tc = 2 · 20 · 8 = 320 lbf, Vc = 2 · 10 · 8 = 160 lbf.
  const r = designJointPlate(joint, catalogOf(plate(5, 8, 20, 10)));
  const steel = (kind: string) => r.steel.find((s) => s.kind === kind)!;

  it('checks the steel across the chord’s top face, crossed by both webs together', () => {
    expect(r.steel.map((s) => [s.kind, s.line, s.member])).toEqual([
      ['tension', 'chordFace', 'W1, W2'],
      ['shear', 'chordFace', 'W1, W2'],
      ['combined', 'chordFace', 'W1, W2'],
    ]);
    expect(steel('tension').section).toBeWithin(8 * IN, { rel: 1e-9 });
  });

  it('hand-calculated tension, shear and combined, each combination on its own', () => {
    // Σ N d: case 1 (200 + 80)/√2 up = 197.99 (tension), (200 − 80)/√2 along = 84.85 (shear);
    // case 2 (150 − 60)/√2 = 63.64 up, (150 + 60)/√2 = 148.49 along.
    expect(toLbf(steel('tension').demand)).toBeWithin(280 * R2, { rel: 1e-9 });
    expect(toLbf(steel('tension').capacity)).toBeWithin(320, { rel: 1e-9 });
    expect(steel('tension').ratio).toBeWithin(197.9899 / 320, { rel: 1e-6 });
    expect(toLbf(steel('shear').demand)).toBeWithin(210 * R2, { rel: 1e-9 });
    expect(toLbf(steel('shear').capacity)).toBeWithin(160, { rel: 1e-9 });
    // Combined: case 1 (197.99/320)² + (84.85/160)² = 0.3828 + 0.2813 = 0.6641; case 2
    // (63.64/320)² + (148.49/160)² = 0.0396 + 0.8613 = 0.9009 → √0.9009 = 0.9492.
    expect(steel('combined').ratio).toBeWithin(
      Math.sqrt(((90 * R2) / 320) ** 2 + ((210 * R2) / 160) ** 2),
      {
        rel: 1e-9,
      },
    );
    expect(steel('combined').ratio).toBeWithin(0.9492, { abs: 1e-4 });
    expect(toLbf(steel('combined').demand)).toBeWithin(Math.hypot(90, 210) * R2, { rel: 1e-9 });
    expect(r.governs).toMatchObject({ check: 'combined', member: 'W1, W2' });
    expect(r.ratio).toBeWithin(steel('combined').ratio);
  });

  it('without signed forces adds the magnitudes (a bound)', () => {
    const unsigned: PlateJoint = {
      ...joint,
      members: joint.members.map(({ steelForces: _, ...m }) => m),
    };
    // Shear 20 lbf/in here (Vc = 320 lbf): the bound needs more than the signed cases.
    const u = designJointPlate(unsigned, catalogOf(plate(5, 8, 20, 20)));
    // |F| = 200 and 80: (200 + 80)/√2 both square to the face and along it.
    const t = u.steel.find((s) => s.kind === 'tension')!;
    const v = u.steel.find((s) => s.kind === 'shear')!;
    expect(toLbf(t.demand)).toBeWithin(280 * R2, { rel: 1e-9 });
    expect(toLbf(v.demand)).toBeWithin(280 * R2, { rel: 1e-9 });
  });

  it('a plate whose steel fails is passed over for one that holds', () => {
    // Shear 8 lbf/in: Vc = 128 lbf < 148.49.
    expect(() => designJointPlate(joint, catalogOf(plate(5, 8, 20, 8)))).toThrow(
      /W1, W2 \(steel shear across the chord's face\)/,
    );
  });
});

describe('a king post peak (4/12)', () => {
  // Top chords leave the peak down to either side at atan(4/12) = 18.43°, the king post straight
  // down. The plate lies level (square to the chords' bisector); the joint line is the vertical
  // through the peak, its steel the plate's 6 in width. Each top chord's force crosses it: its
  // horizontal part as tension, its vertical part as shear. The king post lies along the line
  // and is not credited (conservative).
  const joint: PlateJoint = {
    id: 'B',
    x: 0,
    y: 0,
    members: [
      member('TC1', 'topChord', -12, -4, [-300]),
      member('TC2', 'topChord', 12, -4, [-300]),
      member('KP', 'web', 0, -1, [100]),
    ],
  };
  const r = designJointPlate(joint, catalogOf(plate(6, 8, 100, 50)));
  const steel = (kind: string) => r.steel.find((s) => s.kind === kind)!;

  it('hand-calculated steel across the peak line', () => {
    expect(Math.abs(Math.sin(r.angle))).toBeLessThan(1e-9);
    expect(steel('tension').line).toBe('joint');
    expect(steel('tension').section).toBeWithin(6 * IN, { rel: 1e-9 });
    // T = 300 · 12/√160 = 284.60 lbf against 2 · 100 · 6 = 1200; V = 300 · 4/√160 = 94.87
    // against 2 · 50 · 6 = 600; combined √((284.60/1200)² + (94.87/600)²) = √0.08125 = 0.2850.
    const t = (300 * 12) / Math.sqrt(160);
    const v = (300 * 4) / Math.sqrt(160);
    expect(toLbf(steel('tension').demand)).toBeWithin(t, { rel: 1e-9 });
    expect(toLbf(steel('tension').capacity)).toBeWithin(1200, { rel: 1e-9 });
    expect(toLbf(steel('shear').demand)).toBeWithin(v, { rel: 1e-9 });
    expect(toLbf(steel('shear').capacity)).toBeWithin(600, { rel: 1e-9 });
    expect(steel('combined').ratio).toBeWithin(Math.sqrt((t / 1200) ** 2 + (v / 600) ** 2), {
      rel: 1e-9,
    });
    expect(steel('combined').ratio).toBeWithin(0.285, { abs: 1e-4 });
  });
});
