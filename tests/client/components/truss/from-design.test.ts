import { describe, expect, it } from 'vitest';
import { designInputSchema, toEngineInput } from '../../../../shared/api/design';
import { designTruss } from '../../../../shared/engine/design';
import { drawingOfStoredLine, runDesign } from '../../../../src/components/truss/run-design';
import { isPresentedDesign } from '../../../../src/components/truss/from-design';

// A 28 ft Fink at 6/12 with 12 in overhangs and typical loads (DESIGN.md §1, common practice).
const draft = {
  units: 'imperial',
  profile: 'fink',
  span: 336,
  pitch: 6,
  overhang: 12,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
} as const;

describe('drawing of a presented design', () => {
  it('brings joints and governing forces back to mm and N (1 in = 25.4 mm, 1 lbf = 4.4482216152605 N, exact)', () => {
    const input = designInputSchema.parse(draft);
    const si = designTruss(toEngineInput(input));
    const { presented, drawing } = runDesign(input);
    expect(isPresentedDesign(presented)).toBe(true);
    for (const j of si.joints) {
      const d = drawing.joints.find((x) => x.id === j.id)!;
      // Presented lengths keep 3 decimals of an inch.
      expect(d.x).toBeWithin(j.x, { abs: 0.0005 * 25.4 });
      expect(d.y).toBeWithin(j.y, { abs: 0.0005 * 25.4 });
    }
    for (const m of si.members) {
      const k = si.combinations.findIndex((c) => c.name === m.governingCombination);
      const d = drawing.members.find((x) => x.id === m.id)!;
      // Presented forces keep 0.1 lbf.
      expect(d.force!).toBeWithin(m.forces[k], { abs: 0.05 * 4.4482216152605 + 1e-9 });
      expect(d.csi).toBeWithin(m.csi, { abs: 0.0005 });
    }
    expect(drawing.supports.map((s) => s.type)).toEqual(['pin', 'roller']);
    expect(drawing.overhangs.map((o) => o.side).sort()).toEqual(['left', 'right']);
    expect(drawing.pitch).toBe(6);
  });

  it('draws a stored line from its server result and its design input', () => {
    const { presented } = runDesign(designInputSchema.parse(draft));
    const stored = drawingOfStoredLine({ ...draft }, presented);
    expect(stored.overhangs).toHaveLength(2);
    const bad = drawingOfStoredLine({ units: 'imperial' }, presented);
    expect(bad.overhangs).toEqual([]);
    expect(bad.members).toHaveLength(presented.members.length);
  });
});
