import { describe, expect, it } from 'vitest';
import { computeDesign } from '../../../../server/services/design';
import { jointPlateRows } from '../../../../server/services/shopPaper/plateSchedule';
import type { ShopLine } from '../../../../server/services/shopPaper/lines';
import { FINK_24 } from '../../../support/factories';

const line = (mutate: (d: ShopLine['design']) => void = () => undefined): ShopLine => {
  const d = computeDesign(FINK_24, { plies: 1 });
  const design = structuredClone(d.result);
  mutate(design);
  return {
    id: 1,
    mark: 'T1',
    description: d.description,
    quantity: 1,
    plies: 1,
    engineVersion: d.engineVersion,
    designInput: d.input as unknown as Record<string, unknown>,
    design,
  };
};

describe('plate positions', () => {
  it('recovers positions of designs stored before they were kept (same engine version)', () => {
    const kept = jointPlateRows(line());
    const old = jointPlateRows(
      line((d) => {
        for (const p of d.plates) {
          delete p.angleDeg;
          delete p.offset;
        }
      }),
    );
    expect(old).toEqual(kept);
  });

  it('says the position is not stored when the engine has moved on', () => {
    const l = line((d) => {
      for (const p of d.plates) delete p.angleDeg;
    });
    l.engineVersion = '0.9.0';
    for (const r of jointPlateRows(l)) {
      expect(r.angleDeg).toBeNull();
      expect(r.position).toMatch(/^Position not stored/);
    }
  });
});
