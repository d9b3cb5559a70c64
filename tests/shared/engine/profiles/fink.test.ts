import { describe, expect, it } from 'vitest';
import { generateProfile } from '../../../../shared/engine/profiles/generate';

const FT = 304.8;

// Fink panel points as the trade draws them (common practice): top chord at the quarter-points
// of the span, bottom chord at the third-points. Coordinates worked by hand for 24 ft at 4/12:
// rise 12 ft × 4/12 = 4 ft; quarter-point height 6 ft × 4/12 = 2 ft.
describe('fink', () => {
  it('24 ft, 4/12, pointed heels', () => {
    const p = generateProfile({
      kind: 'fink',
      span: 24 * FT,
      pitch: 4,
      heelHeight: 0,
      overhangLeft: 0,
      overhangRight: 0,
    });
    const xy = Object.fromEntries(p.joints.map((j) => [j.id, [j.x / FT, j.y / FT]]));
    const expected: Record<string, [number, number]> = {
      A: [0, 0],
      B: [8, 0],
      C: [16, 0],
      D: [24, 0],
      E: [6, 2],
      F: [12, 4],
      G: [18, 2],
    };
    for (const [id, [x, y]] of Object.entries(expected)) {
      expect(xy[id][0]).toBeWithin(x, { abs: 1e-9 });
      expect(xy[id][1]).toBeWithin(y, { abs: 1e-9 });
    }
    // Short web BE: from (8, 0) to (6, 2) ft = 2√2 ft; long web BF: (8, 0) to (12, 4) = 4√2 ft.
    const len = (id: string) => p.members.find((m) => m.id === id)!.length / FT;
    expect(len('BE')).toBeWithin(2 * Math.SQRT2, { rel: 1e-12 });
    expect(len('BF')).toBeWithin(4 * Math.SQRT2, { rel: 1e-12 });
    // Top chord panel 6 ft run × √(1 + (4/12)²).
    expect(len('AE')).toBeWithin(6 * Math.sqrt(1 + 1 / 9), { rel: 1e-12 });
  });

  it('raised heel: heel post, heel web from the bearing, web down to the first third-point', () => {
    const p = generateProfile({
      kind: 'fink',
      span: 24 * FT,
      pitch: 4,
      heelHeight: 1 * FT,
      overhangLeft: 0,
      overhangRight: 0,
    });
    const [heel, point] = p.topChordJoints;
    const at = new Map(p.joints.map((j) => [j.id, j]));
    // The heel web's top-chord point sits a quarter of the way to the first quarter-point (L/4).
    expect(at.get(point)!.x).toBeWithin((24 * FT) / 16, { rel: 1e-12 });
    const webs = new Set(p.members.filter((m) => m.role === 'web').map((m) => m.id));
    for (const id of [`A${heel}`, `A${point}`, `B${point}`]) expect(webs.has(id)).toBe(true);
    expect(p.rise).toBeWithin(5 * FT);
  });
});
