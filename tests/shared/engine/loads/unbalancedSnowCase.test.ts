import { describe, expect, it } from 'vitest';
import type { CaseLoads } from '../../../../shared/engine/loads';
import {
  unbalancedSnowCase,
  type UnbalancedSnow,
} from '../../../../shared/engine/loads/unbalancedSnow';
import { kpa, mm } from '../../../../shared/engine/units';
import { finkWithLengths as profile } from './support/finkProfile';

/**
 * ASCE 7-16 §7.6.1 (from memory) on the hand-built 6000 mm 4:12 Fink with 600 mm overhangs,
 * trusses at 600 mm: windward 0.3 kPa, leeward 1.0 kPa, surcharge 0.5 kPa over 1000 mm from the
 * ridge (round numbers, not a site). Panel-point loads by tributary run (common practice) and
 * the surcharge by simple-beam statics, worked by hand in N.
 */
const snow: UnbalancedSnow = {
  windward: kpa(0.3),
  leeward: kpa(1),
  surcharge: kpa(0.5),
  extent: mm(1000),
  hd: mm(400),
  gammaPcf: 17.9,
};
const spacing = mm(600);
const fy = (c: CaseLoads, joint: string) => c.jointLoads.find((j) => j.joint === joint)!.fy;
const total = (c: CaseLoads) => c.jointLoads.reduce((s, j) => s + (j.fy ?? 0), 0);

describe('unbalanced snow case on the truss', () => {
  it('wind from the left: 0.18 N/mm windward, 0.6 N/mm leeward, 0.3 N/mm surcharge on CD', () => {
    const c = unbalancedSnowCase(profile, spacing, snow, 'left');
    // A: half of AB (0.18 × 1500 / 2) + its overhang (0.18 × 600).
    expect(fy(c, 'A')).toBeWithin(-(135 + 108));
    expect(fy(c, 'B')).toBeWithin(-270);
    // C: 135 windward + 450 leeward + 300 N surcharge at 500 mm from C on a 1500 mm run → 200 N.
    expect(fy(c, 'C')).toBeWithin(-(135 + 450 + 200));
    expect(fy(c, 'D')).toBeWithin(-(900 + 100));
    expect(fy(c, 'E')).toBeWithin(-(450 + 360));
    expect(total(c)).toBeWithin(-(0.18 * 3600 + 0.6 * 3600 + 0.3 * 1000));
    // Overhang moments w·a²/2: 0.18 × 600² / 2 and 0.6 × 600² / 2.
    expect(c.overhangMoments.map((o) => [o.side, o.moment])).toEqual([
      ['left', expect.closeTo(32_400, 6)],
      ['right', expect.closeTo(108_000, 6)],
    ]);
  });

  it('wind from the right mirrors it, the surcharge on BC', () => {
    const c = unbalancedSnowCase(profile, spacing, snow, 'right');
    expect(fy(c, 'E')).toBeWithin(-(135 + 108));
    expect(fy(c, 'B')).toBeWithin(-(900 + 100));
    expect(fy(c, 'C')).toBeWithin(-(135 + 450 + 200));
    expect(fy(c, 'A')).toBeWithin(-(450 + 360));
  });

  it('a surcharge longer than the half-span stops at the heel, not on the overhang', () => {
    for (const side of ['left', 'right'] as const) {
      const c = unbalancedSnowCase(profile, spacing, { ...snow, extent: mm(5000) }, side);
      expect(total(c)).toBeWithin(-(0.18 * 3600 + 0.6 * 3600 + 0.3 * 3000));
    }
  });
});
