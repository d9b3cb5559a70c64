import { describe, expect, it } from 'vitest';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import type { PlateJoint, PlateSpec } from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm } from '../../../../shared/engine/units';

// 2x4 depth 3½ in (NDS 2018 Supplement Table 1A). Test-only plate values (round numbers).
const IN = 25.4;
const plate: PlateSpec = {
  id: '6x10',
  gauge: 20,
  width: 6,
  length: 10,
  lateralValue: { aa: 150, ea: 150, ae: 100, ee: 100 },
  tensionValue: 1000,
  shearValue: 500,
};
const catalog = { id: 't', label: 'test values', demo: false, plates: [plate] };

/**
 * Steel capacities take no load-duration factor (tooth holding does): a design passes the tooth
 * demand as |F|/CD and the full |F| for the steel. Under roof live load (CD 1.25) the steel sees
 * 1.25× the tooth demand, under wind (CD 1.6) 1.6×.
 */
describe('plate steel with the full force', () => {
  const heel = (force: number, steel?: number): PlateJoint => ({
    id: 'A',
    x: 0,
    y: 0,
    kind: 'heel',
    members: [
      {
        id: 'TC',
        role: 'topChord',
        direction: { x: 12, y: 6 },
        depth: mm(3.5 * IN),
        force: lbfToN(lbf(force)),
        ...(steel !== undefined && { steelForce: lbfToN(lbf(steel)) }),
      },
      {
        id: 'BC',
        role: 'bottomChord',
        direction: { x: 1, y: 0 },
        depth: mm(3.5 * IN),
        force: lbfToN(lbf(500)),
      },
    ],
  });

  it('heel steel shear and tension take steelForce, not the (CD-divided) tooth force', () => {
    // 1000 lb under D + Lr: tooth demand 1000/1.25 = 800 lb; steel shear 1000·cosθ, 6/12 pitch.
    const r = designJointPlate(heel(800, 1000), catalog);
    const shear = r.steel.find((s) => s.kind === 'shear')!;
    const tension = r.steel.find((s) => s.kind === 'tension')!;
    expect(shear.demand).toBeWithin(lbfToN(lbf((1000 * 12) / Math.sqrt(180))), { rel: 1e-9 });
    expect(tension.demand).toBeWithin(lbfToN(lbf((1000 * 6) / Math.sqrt(180))), { rel: 1e-9 });
    expect(r.members.find((m) => m.member === 'TC')!.demand).toBeWithin(lbfToN(lbf(800)), {
      rel: 1e-9,
    });
  });

  it('without steelForce the steel takes the member force (a single-load call)', () => {
    const r = designJointPlate(heel(800), catalog);
    const shear = r.steel.find((s) => s.kind === 'shear')!;
    expect(shear.demand).toBeWithin(lbfToN(lbf((800 * 12) / Math.sqrt(180))), { rel: 1e-9 });
  });
});
