import { describe, expect, it } from 'vitest';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import type { PlateJoint } from '../../../../shared/engine/plates/types';
import { lbf, lbfToN, mm } from '../../../../shared/engine/units';
import { catalogOf, roundPlate } from './support/roundPlate';

const IN = 25.4;
const catalog = catalogOf(roundPlate(10, 16, 5000));

/** A pointed heel of a 6/12 top chord on a 3/12 bottom chord (2x4s), with its 20 in overhang. */
const heel = (overhang: 'none' | 'part' | 'member'): PlateJoint => {
  const top = { x: 2, y: 1 };
  return {
    id: 'A',
    x: 0,
    y: 0,
    kind: 'heel',
    members: [
      { id: 'TC', role: 'topChord', direction: top, depth: mm(3.5 * IN), force: lbfToN(lbf(100)) },
      {
        id: 'BC',
        role: 'bottomChord',
        direction: { x: 4, y: 1 },
        depth: mm(3.5 * IN),
        force: lbfToN(lbf(100)),
      },
      ...(overhang === 'none'
        ? []
        : [
            {
              id: 'OH',
              role: 'topChord' as const,
              direction: { x: -top.x, y: -top.y },
              depth: mm(3.5 * IN),
              force: lbfToN(lbf(1)),
              length: mm(20 * IN),
              ...(overhang === 'part' && { partOf: 'TC' }),
            },
          ]),
    ],
  };
};

describe('a pointed heel: the top chord board runs on into its overhang', () => {
  const area = (j: PlateJoint, id: string) =>
    designJointPlate(j, catalog).members.find((c) => c.member === id)!.area;

  it("the overhang's wood under the plate joins the top chord's contact area", () => {
    // The same joint with the overhang as a member of its own reports the overhang's region;
    // as a part of the top chord's board, the top chord's area is its own plus that region.
    const own = area(heel('member'), 'TC');
    const oh = area(heel('member'), 'OH');
    expect(oh).toBeGreaterThan(0);
    expect(area(heel('part'), 'TC')).toBeWithin(own + oh, { rel: 1e-9 });
    // The part has no check of its own.
    expect(designJointPlate(heel('part'), catalog).members.map((c) => c.member)).toEqual([
      'TC',
      'BC',
    ]);
    // Without the overhang the top chord has only its band inside the heel.
    expect(area(heel('none'), 'TC')).toBeWithin(own, { rel: 1e-9 });
  });

  it('HR from the angle between the chords: tan(θt − θb) = (0.5 − 0.25)/(1 + 0.125) = 0.2222 → 0.8167', () => {
    // ANSI/TPI 1-2014 heel reduction, from memory: HR = 0.85 − 0.05(12 tan θ − 2) =
    // 0.85 − 0.05 × (2.6667 − 2) = 0.81667; the roof slope alone (6/12) would give 0.65.
    const tc = designJointPlate(heel('part'), catalog).members.find((c) => c.member === 'TC')!;
    expect(tc.heelFactor).toBeWithin(0.85 - 0.05 * (12 * (0.25 / 1.125) - 2), { rel: 1e-9 });
    expect(tc.heelFactor).toBeWithin(0.81667, { abs: 1e-5 });
  });
});
