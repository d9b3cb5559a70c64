import { describe, expect, it } from 'vitest';
import { designTruss, type TrussDesign } from '../../../../shared/engine/design';
import { engineInput, lightFink } from './support/inputs';

const N_PER_LB = 4.4482216152605; // 1 lbf in N (exact)

const lb = (n: number) => n / N_PER_LB;
const combo = (d: TrussDesign, name: string) => d.combinations.findIndex((c) => c.name === name);

/**
 * A truss with overhangs under wind (engine 1.4.1: the overhang-only wind loads used to drop the
 * member the overhang continues, and every design with an overhang and a wind site was refused).
 * 24 ft 4/12 Fink, 12 in. overhangs, 24 in. o.c., 115 mph, exposure C, h = 15 ft, by hand:
 * qh = 0.00256·Kz·Kd·V² (ASCE 7-16 Eq. 26.10-1); roof zones 2/3 of Fig. 28.3-1 (from memory),
 * net p = qh·(GCpf − GCpi); the overhang top takes qh·GCpf only and the windward soffit qh·0.7
 * upward (§28.3.3, from memory). Vertical per unit horizontal run: p.
 */
describe('wind on a truss with overhangs', () => {
  it('case A from the left, +GCpi: the uplift includes the overhangs and the windward soffit', () => {
    const d = designTruss(
      engineInput(
        lightFink({
          loads: {
            tcll: 20,
            tcdl: 10,
            bcll: 0,
            bcdl: 10,
            wind: { speed: 115, exposure: 'C', meanRoofHeight: 15 * 12 },
          },
        }),
      ),
    );
    const qh = 0.00256 * 2.01 * (15 / 900) ** (2 / 9.5) * 0.85 * 115 ** 2; // psf
    const theta = (Math.atan(4 / 12) * 180) / Math.PI;
    const zone3 = -0.37 - (0.11 * (theta - 5)) / 15;
    const pw = qh * (-0.69 - 0.18);
    const pl = qh * (zone3 - 0.18);
    // 12 ft of roof and 1 ft of overhang each side, 2 ft spacing (lb, + up).
    const up = (-(pw + pl) * 12 - qh * (-0.69 + zone3) * 1 + 0.7 * qh * 1) * 2;
    const sumV = (k: number) => lb(d.reactions[0].vertical[k] + d.reactions[1].vertical[k]);
    expect(sumV(combo(d, 'D')) - sumV(combo(d, 'D + 0.6W[AL+]'))).toBeWithin(0.6 * up, {
      rel: 1e-6,
    });
  });
});
