import { describe, expect, it } from 'vitest';
import { checkMember } from '../../../../shared/engine/members';
import { MPA_PER_PSI } from '../../../../shared/engine/units';
import { LB_IN, LB_N } from './helpers';

/**
 * The panel-point moment with and without the NDS 2018 §3.9.2 amplifier. MST course 5260
 * Problem 7.32 (engineering.md §2, Example C): 2x6 DF-L No.1 stud, 16 in o.c., lu = 14 ft,
 * D + W: P = 800 plf × 16/12 ft, M = wL²/8 with 20 plf → interaction 0.488 with the amplifier.
 * Given as a panel-point moment (span moment 0), the amplified setting must reproduce 0.488;
 * the common-practice check is (fc/Fc′)² + fb/Fb′, smaller.
 */
describe('panel-point moment: amplified (plant setting) and unamplified (common practice)', () => {
  const IN = 25.4;
  const stud = 16 / 12;
  const mWind = ((20 * 14 ** 2) / 8) * 12; // lb·in
  const input = {
    lumberId: '2x6 DFL-1',
    plies: 1,
    leStrong: 14 * 12 * IN,
    leWeak: 0,
    repetitive: true,
    axial: -800 * stud * LB_N,
    moment: mWind * LB_IN,
    spanMoment: 0,
    supportMoment: mWind * LB_IN,
    cd: 1.6,
  };

  it('amplified: the NDS 2018 §3.9.2 value 0.488 of Example C', () => {
    const r = checkMember({ ...input, amplifyPanelPoint: true });
    expect(r.ratios.compressionBending).toBeWithin(0.488, { abs: 6e-4 });
  });

  it('unamplified: (fc/Fc′)² + fb/Fb′, with Fb′ = 1000·1.6·1.3·1.15 = 2,392 psi', () => {
    const r = checkMember(input);
    const fc = (800 * stud) / 8.25; // psi
    const fcPrime = r.capacities.fcPrime / MPA_PER_PSI; // psi (Cp is checked elsewhere)
    const fb = mWind / 7.563;
    const expected = (fc / fcPrime) ** 2 + fb / (1000 * 1.6 * 1.3 * 1.15);
    expect(r.ratios.compressionBending).toBeWithin(expected, { rel: 2e-3 });
    expect(r.ratios.compressionBending!).toBeLessThan(0.488);
  });
});
