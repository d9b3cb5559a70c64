import { describe, expect, it } from 'vitest';
import { DEMO_PLATE_CATALOG, validatePlateCatalog } from '../../../../shared/engine/plates/catalog';
import { designJointPlate } from '../../../../shared/engine/plates/design';
import { EngineError } from '../../../../shared/engine/errors';
import { mm, newton } from '../../../../shared/engine/units';

describe('demo plate catalog', () => {
  it('is flagged as demo and says its values are invented', () => {
    expect(DEMO_PLATE_CATALOG.demo).toBe(true);
    expect(DEMO_PLATE_CATALOG.label).toMatch(/invented/i);
    expect(DEMO_PLATE_CATALOG.label).toMatch(/not for construction/i);
  });

  it('covers 3x4 to 8x12 in 20 and 18 gauge with unique ids, and validates', () => {
    const ids = DEMO_PLATE_CATALOG.plates.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toContain('3x4-20');
    expect(ids).toContain('8x12-18');
    expect(validatePlateCatalog(DEMO_PLATE_CATALOG)).toBe(DEMO_PLATE_CATALOG);
  });

  it('passes the demo flag on to every plate design', () => {
    const r = designJointPlate(
      {
        id: 'S',
        x: 0,
        y: 0,
        members: [
          {
            id: 'L',
            role: 'bottomChord',
            direction: { x: -1, y: 0 },
            depth: mm(88.9),
            force: newton(100),
          },
        ],
      },
      DEMO_PLATE_CATALOG,
    );
    expect(r.demo).toBe(true);
  });
});

describe('validatePlateCatalog', () => {
  it('lists every problem in readable words', () => {
    const bad = {
      id: 'plant',
      label: 'Plant plates',
      plates: [
        {
          id: '3x4',
          gauge: 20.5,
          width: 3,
          length: -4,
          lateralValue: { aa: 100, ea: 90, ae: -1, ee: 70 },
          tensionValue: 1000,
          shearValue: 0,
        },
        { id: '3x4', gauge: 20, width: 3, length: 4 },
      ],
    };
    try {
      validatePlateCatalog(bad);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineError);
      const issues = (e as EngineError).details!.issues as string[];
      expect(issues).toEqual(
        expect.arrayContaining([
          'Catalog must say whether it is a demo (demo: true/false)',
          'Plate 3x4: gauge must be a whole number 10–28',
          'Plate 3x4: length must be over 0 and at most 48 in',
          'Plate 3x4: lateral value AE must be a positive lbf/in²',
          'Plate 3x4: shear value must be a positive lbf/in',
          'Plate 3x4: id is used twice',
        ]),
      );
    }
    expect(() => validatePlateCatalog(null)).toThrow(EngineError);
    expect(() => validatePlateCatalog({ id: 'x', label: 'x', demo: false, plates: [] })).toThrow(
      /at least one plate/,
    );
  });
});
