import { describe, expect, it } from 'vitest';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import { heelReduction, lateralValue } from '../../../../shared/engine/plates/lateral';
import type { PlateJoint, PlateSpec } from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm, psiToMpa, psi } from '../../../../shared/engine/units';

// Test-only plate values, round numbers (not from any evaluation report). 2x4 depth 3½ in
// (NDS 2018 Supplement Table 1A).
const IN = 25.4;
const DEG = Math.PI / 180;
const plate: PlateSpec = {
  id: '6x10',
  gauge: 20,
  width: 6,
  length: 10,
  lateralValue: { aa: 120, ea: 100, ae: 80, ee: 60 },
  tensionValue: 1000,
  shearValue: 500,
};
const catalog = { id: 't', label: 'test values', demo: false, plates: [plate] };

describe('lateral value by plate orientation and load-to-grain angle (ANSI/TPI 1-2014, from memory)', () => {
  it('gives the four tested values at 0° and 90°', () => {
    expect(lateralValue(plate, 0, 0)).toBeWithin(120); // AA
    expect(lateralValue(plate, 90 * DEG, 0)).toBeWithin(100); // EA
    expect(lateralValue(plate, 0, 90 * DEG)).toBeWithin(80); // AE
    expect(lateralValue(plate, 90 * DEG, 90 * DEG)).toBeWithin(60); // EE
  });

  it('interpolates the plate-to-load angle on a straight line', () => {
    // 45°: (120 + 100)/2 = 110; 30°: 120 − 20 · 30/90 = 113.33.
    expect(lateralValue(plate, 45 * DEG)).toBeWithin(110);
    expect(lateralValue(plate, 30 * DEG)).toBeWithin(120 - 20 / 3);
    // An undirected line: −30° and 150° are 30°.
    expect(lateralValue(plate, -30 * DEG)).toBeWithin(120 - 20 / 3);
    expect(lateralValue(plate, 150 * DEG)).toBeWithin(120 - 20 / 3);
  });

  it('takes intermediate load-to-grain angles by Hankinson', () => {
    // α = 0, θ = 45°: P·Q/(P/2 + Q/2) = 2 · 120 · 80 / 200 = 96.
    expect(lateralValue(plate, 0, 45 * DEG)).toBeWithin(96);
    // α = 45°: P = 110, Q = 70; θ = 30°: 7700 / (110 · ¼ + 70 · ¾) = 7700 / 80 = 96.25.
    expect(lateralValue(plate, 45 * DEG, 30 * DEG)).toBeWithin(96.25);
  });
});

describe('heel-joint reduction HR = 0.85 − 0.05 (12 tan θ − 2.0), 0.65…0.85 (ANSI/TPI 1-2014, from memory)', () => {
  const slope = (rise: number) => Math.atan(rise / 12);
  it('hand values by pitch', () => {
    expect(heelReduction(slope(2))).toBeWithin(0.85); // 0.85 − 0.05 · 0
    expect(heelReduction(slope(3))).toBeWithin(0.8); // 0.85 − 0.05 · 1
    expect(heelReduction(slope(4))).toBeWithin(0.75); // 0.85 − 0.05 · 2
    expect(heelReduction(slope(5))).toBeWithin(0.7);
    expect(heelReduction(slope(6))).toBeWithin(0.65);
  });
  it('is kept within 0.65…0.85', () => {
    expect(heelReduction(slope(1))).toBeWithin(0.85); // 0.90 by the formula
    expect(heelReduction(0)).toBeWithin(0.85);
    expect(heelReduction(slope(8))).toBeWithin(0.65); // 0.55 by the formula
    expect(heelReduction(slope(12))).toBeWithin(0.65);
  });
});

describe('tooth capacity in the plate design', () => {
  const capPerArea = (r: ReturnType<typeof designJointPlate>, id: string) => {
    const c = r.members.find((m) => m.member === id)!;
    // lbf per in² of contact per face.
    return c.capacity / lbfToN(lbf(1)) / (2 * (c.area / (IN * IN)));
  };

  it('a 45° web on a straight bottom chord takes the value halfway between AA and EA', () => {
    const joint: PlateJoint = {
      id: 'P',
      x: 0,
      y: 0,
      members: [
        {
          id: 'BC1',
          role: 'bottomChord',
          direction: { x: -1, y: 0 },
          depth: mm(3.5 * IN),
          force: lbfToN(lbf(300)),
        },
        {
          id: 'BC2',
          role: 'bottomChord',
          direction: { x: 1, y: 0 },
          depth: mm(3.5 * IN),
          force: lbfToN(lbf(300)),
        },
        {
          id: 'W',
          role: 'web',
          direction: { x: 1, y: 1 },
          depth: mm(3.5 * IN),
          force: lbfToN(lbf(300)),
        },
      ],
    };
    const r = designJointPlate(joint, catalog);
    const w = r.members.find((m) => m.member === 'W')!;
    expect(w.plateToLoad).toBeWithin(45 * DEG, { rel: 1e-9 });
    expect(w.lateralValue).toBeWithin(psiToMpa(psi(110)), { rel: 1e-9 });
    expect(capPerArea(r, 'W')).toBeWithin(110, { rel: 1e-9 });
    // The chords lie along the plate: AA.
    expect(capPerArea(r, 'BC1')).toBeWithin(120, { rel: 1e-9 });
    expect(w.heelFactor).toBe(1);
  });

  it('a 4/12 heel: the top chord at 18.43° to the plate, reduced by HR = 0.75', () => {
    const joint: PlateJoint = {
      id: 'A',
      x: 0,
      y: 0,
      kind: 'heel',
      members: [
        {
          id: 'TC',
          role: 'topChord',
          direction: { x: 12, y: 4 },
          depth: mm(3.5 * IN),
          force: lbfToN(lbf(400)),
        },
        {
          id: 'BC',
          role: 'bottomChord',
          direction: { x: 1, y: 0 },
          depth: mm(3.5 * IN),
          force: lbfToN(lbf(380)),
        },
      ],
    };
    const r = designJointPlate(joint, catalog);
    const tc = r.members.find((m) => m.member === 'TC')!;
    // α = atan(4/12) = 18.435°: 120 − 20 · 18.435/90 = 115.903 lbf/in²; × 0.75 = 86.93.
    const alpha = Math.atan(4 / 12) / DEG;
    expect(alpha).toBeWithin(18.43495, { abs: 1e-5 });
    expect(tc.heelFactor).toBeWithin(0.75);
    expect(capPerArea(r, 'TC')).toBeWithin((120 - (20 * alpha) / 90) * 0.75, { rel: 1e-9 });
    expect(capPerArea(r, 'TC')).toBeWithin(86.93, { abs: 0.01 });
    // The bottom chord takes no reduction.
    expect(r.members.find((m) => m.member === 'BC')!.heelFactor).toBe(1);
    expect(capPerArea(r, 'BC')).toBeWithin(120, { rel: 1e-9 });
  });
});
