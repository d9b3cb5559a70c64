import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import type { PlateJoint } from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm, psi, psiToMpa } from '../../../../shared/engine/units';
import { engineInput, lightFink } from '../design/support/inputs';
import { catalogOf, roundPlate } from './support/roundPlate';

// 2x4 depth 3½ in (NDS 2018 Supplement Table 1A).
const IN = 25.4;
const DEG = Math.PI / 180;
const catalog = catalogOf(roundPlate(6, 10));

/** A straight bottom chord through a panel point with a vertical web; BC1 carries `cases`. */
const joint = (cases: { force: number; loadToGrain: number }[]): PlateJoint => ({
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
      toothCases: cases,
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
      direction: { x: 0, y: 1 },
      depth: mm(3.5 * IN),
      force: lbfToN(lbf(50)),
    },
  ],
});

/**
 * The chord's load on the plate is the vector sum of its axial force N and its end shear V:
 * |R| = √(N² + V²) at θ = atan(V/N) to the grain, whose tooth value follows Hankinson's formula
 * P·Q/(P sin²θ + Q cos²θ) (the form of NDS 2018 Appendix J, as ANSI/TPI 1-2014 uses it for
 * plate teeth — from memory). Hand values with the test plate above: the chord lies along the
 * plate, so the plate-to-load angle is θ as well; α = 30°: P = 120 − 20·30/90 = 113.333 (AA→EA),
 * Q = 80 − 20·30/90 = 73.333 (AE→EE); value = 113.333·73.333/(113.333·¼ + 73.333·¾)
 * = 8,311.1/83.333 = 99.733 lbf/in².
 */
describe('chord end shear in the tooth load direction', () => {
  const n = 300;
  const v = 300 * Math.tan(30 * DEG); // 173.21 lb
  const r = Math.hypot(n, v); // 346.41 lb
  const sheared = { force: lbfToN(lbf(r)), loadToGrain: Math.atan2(v, n) };

  it('N = 300 lb with V = 173.2 lb: 346.4 lb at 30° to the grain, 99.733 lbf/in²', () => {
    const c = designJointPlate(joint([sheared]), catalog).members.find((m) => m.member === 'BC1')!;
    expect(c.loadToGrain).toBeWithin(30 * DEG, { rel: 1e-9 });
    expect(c.plateToLoad).toBeWithin(30 * DEG, { rel: 1e-9 });
    expect(c.lateralValue).toBeWithin(psiToMpa(psi(99.733)), { rel: 1e-5 });
    expect(c.demand / lbfToN(lbf(1))).toBeWithin(346.41, { abs: 0.01 });
    // Capacity per in² of contact, per face: the Hankinson value.
    expect(c.capacity / lbfToN(lbf(1)) / (2 * (c.area / (IN * IN)))).toBeWithin(99.733, {
      abs: 1e-3,
    });
  });

  it('of several combinations, the one with the largest demand over tooth value governs', () => {
    // 400 lb along the grain: 400/120 = 3.333 < 346.41/99.733 = 3.473 → the sheared case.
    const a = designJointPlate(
      joint([{ force: lbfToN(lbf(400)), loadToGrain: 0 }, sheared]),
      catalog,
    ).members.find((m) => m.member === 'BC1')!;
    expect(a.loadToGrain).toBeWithin(30 * DEG, { rel: 1e-9 });
    // 420 lb along the grain: 420/120 = 3.5 > 3.473 → the axial case.
    const b = designJointPlate(
      joint([{ force: lbfToN(lbf(420)), loadToGrain: 0 }, sheared]),
      catalog,
    ).members.find((m) => m.member === 'BC1')!;
    expect(b.loadToGrain).toBe(0);
    expect(b.demand / lbfToN(lbf(1))).toBeWithin(420, { rel: 1e-9 });
  });
});

describe('a designed truss: chords at the heel take their end shear', () => {
  it('the heel plate of a 24 ft Fink sees the top chord load off its grain, at least its axial force', () => {
    const d = designTruss(engineInput(lightFink()));
    const heel = d.plates.find((p) => p.kind === 'heel' && p.ok)!;
    const tcId = d.members.find(
      (m) => m.role === 'topChord' && [m.from, m.to].includes(heel.joint),
    )!;
    const tc = heel.design!.members.find((c) => c.member === tcId.id)!;
    expect(tc.loadToGrain).toBeGreaterThan(0);
    expect(tc.loadToGrain).toBeLessThan(45 * DEG);
    // The demand is over CD; the axial force over the largest CD is a floor.
    const cdMax = Math.max(...d.combinations.map((c) => c.cd));
    expect(tc.demand).toBeGreaterThan(tcId.maxCompression / cdMax);
  });
});
