import { describe, expect, it } from 'vitest';
import type { CaseLoads } from '../../../../shared/engine/loads';
import { eaveToRidge, windCaseLoads, type WindCase } from '../../../../shared/engine/loads/wind';
import { kpa, mm } from '../../../../shared/engine/units';
import { finkWithLengths as profile } from './support/finkProfile';

/**
 * ASCE 7-16 Chapter 28 pressures on the hand-built 6000 mm 4:12 Fink (rise 1000 mm, 600 mm
 * overhangs rising 200 mm), trusses at 600 mm. Net roof pressure p = qh·(GCpf − GCpi) acts
 * normal to the chord: over a side it adds up to p × horizontal run vertically and p × rise
 * horizontally. The overhang's top takes the external pressure only, qh·GCpf = p + qh·GCpi;
 * its underside on the windward side qh·0.7 (§28.3.3, from memory) on its horizontal run.
 */
const wind: WindCase = {
  label: 'A, from left, +GCpi',
  id: 'AL+',
  windFrom: 'left',
  loadCase: 'A',
  gcpi: 0.18,
  windward: kpa(-0.5),
  leeward: kpa(-0.3),
  soffit: kpa(0.7),
  qh: kpa(1),
};
const spacing = mm(600);
const sum = (c: CaseLoads) =>
  c.jointLoads.reduce((s, j) => ({ fx: s.fx + (j.fx ?? 0), fy: s.fy + (j.fy ?? 0) }), {
    fx: 0,
    fy: 0,
  });
const moment = (c: CaseLoads, side: string) => c.overhangMoments.find((o) => o.side === side)!;

describe('wind case loads on the truss, by hand (N, mm; + up, + right)', () => {
  // Windward roof 0.5 kPa outward → 0.3 N/mm: up 0.3 × 3000 = 900, toward the wind 0.3 × 1000.
  // Leeward roof 0.3 kPa → 0.18 N/mm: up 540, away 180.
  // Windward overhang top −(−0.5 + 0.18) = 0.32 kPa → 0.192 N/mm: up 115.2, toward 38.4.
  // Leeward overhang top 0.12 kPa → 0.072 N/mm: up 43.2, away 14.4. Soffit 0.42 N/mm × 600: up 252.
  it('wind from the left', () => {
    const c = windCaseLoads(profile, spacing, wind);
    const f = sum(c);
    expect(f.fy).toBeWithin(900 + 540 + 115.2 + 43.2 + 252);
    expect(f.fx).toBeWithin(-300 + 180 - 38.4 + 14.4);
    // Cantilever moments (+ = gravity): −w·s²/2 with s² = 600² + 200², plus the soffit −w·a²/2.
    expect(moment(c, 'left').moment).toBeWithin(-0.192 * 200_000 - 0.42 * 180_000);
    expect(moment(c, 'right').moment).toBeWithin(-0.072 * 200_000);
    // Across each top-chord member: the net pressure × spacing, outward (− along the downward
    // normal); the overhang and soffit add no line load inside the span.
    expect(c.memberLoads.map((l) => [l.member, l.transverse])).toEqual([
      ['AB', expect.closeTo(-0.3, 12)],
      ['BC', expect.closeTo(-0.3, 12)],
      ['CD', expect.closeTo(-0.18, 12)],
      ['DE', expect.closeTo(-0.18, 12)],
    ]);
    const heel = c.jointLoads.find((j) => j.joint === 'A')!;
    // A: half of AB's normal force, the overhang top and the soffit.
    expect(heel.fy).toBeWithin(0.3 * 750 + 115.2 + 252);
  });

  it('wind from the right mirrors it', () => {
    const c = windCaseLoads(profile, spacing, { ...wind, windFrom: 'right' });
    const f = sum(c);
    expect(f.fy).toBeWithin(900 + 540 + 115.2 + 43.2 + 252);
    expect(f.fx).toBeWithin(300 - 180 + 38.4 - 14.4);
    expect(moment(c, 'right').moment).toBeWithin(-0.192 * 200_000 - 0.42 * 180_000);
    expect(c.jointLoads.find((j) => j.joint === 'E')!.fy).toBeWithin(0.3 * 750 + 115.2 + 252);
  });

  it('no soffit load without an overhang or without soffit pressure', () => {
    const bare = { ...profile, overhangs: [] };
    const c = windCaseLoads(bare, spacing, wind);
    expect(sum(c).fy).toBeWithin(900 + 540);
    expect(c.overhangMoments).toEqual([]);
    const noSoffit = windCaseLoads(profile, spacing, { ...wind, soffit: kpa(0) });
    expect(sum(noSoffit).fy).toBeWithin(900 + 540 + 115.2 + 43.2);
  });
});

describe('eave to ridge, horizontal', () => {
  it('ridge to each eave plus its overhang', () => {
    expect(eaveToRidge(profile, 'left')).toBe(3600);
    expect(eaveToRidge(profile, 'right')).toBe(3600);
    const low = {
      ...profile,
      joints: profile.joints.map((j) => (j.id === 'C' ? { ...j, y: 400 } : j)),
      overhangs: profile.overhangs.filter((o) => o.side === 'right'),
    };
    expect(eaveToRidge(low, 'left')).toBe(1500);
    expect(eaveToRidge(low, 'right')).toBe(5100);
  });
});
