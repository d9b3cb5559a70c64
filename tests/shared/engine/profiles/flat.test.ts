import { describe, expect, it } from 'vitest';
import { generateProfile } from '../../../../shared/engine/profiles/generate';

// Pratt layout (common practice): verticals at every panel point, diagonals sloping down toward
// mid-span so they carry tension under gravity.
describe('flat', () => {
  const p = generateProfile({
    kind: 'flat',
    span: 9600,
    pitch: 0,
    heelHeight: 0,
    overhangLeft: 300,
    overhangRight: 0,
    depth: 800,
    panels: 6,
  });
  const at = new Map(p.joints.map((j) => [j.id, j]));

  it('has panels + 1 joints on each chord, equally spaced', () => {
    expect(p.bottomChordJoints).toHaveLength(7);
    expect(p.topChordJoints).toHaveLength(7);
    p.topChordJoints.forEach((id, i) => {
      expect(at.get(id)!.x).toBeWithin(i * 1600);
      expect(at.get(id)!.y).toBe(800);
    });
    expect(p.rise).toBe(800);
  });

  it('puts a vertical at every panel point and one diagonal per panel, down toward mid-span', () => {
    const webs = p.members.filter((m) => m.role === 'web');
    const vertical = webs.filter((m) => at.get(m.from)!.x === at.get(m.to)!.x);
    const diagonal = webs.filter((m) => at.get(m.from)!.x !== at.get(m.to)!.x);
    expect(vertical).toHaveLength(7);
    expect(diagonal).toHaveLength(6);
    for (const m of diagonal) {
      const [a, b] = [at.get(m.from)!, at.get(m.to)!];
      const topEnd = a.y > b.y ? a : b;
      const bottomEnd = a.y > b.y ? b : a;
      // The bottom end is nearer mid-span than the top end.
      expect(Math.abs(bottomEnd.x - 4800)).toBeLessThan(Math.abs(topEnd.x - 4800));
    }
  });

  it('carries a level overhang: slope length = horizontal', () => {
    expect(p.overhangs).toEqual([
      { side: 'left', heelJoint: 'H', horizontal: 300, slopeLength: 300, member: 'HI' },
    ]);
  });
});
