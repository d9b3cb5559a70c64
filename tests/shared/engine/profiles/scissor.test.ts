import { describe, expect, it } from 'vitest';
import { generateProfile } from '../../../../shared/engine/profiles/generate';

const FT = 304.8;

describe('scissor', () => {
  // 32 ft, 6/12 over 3/12 (half the top pitch, typical — common practice). Hand-worked: top peak
  // 16 ft × 6/12 = 8 ft, bottom peak 16 ft × 3/12 = 4 ft, centre vertical 4 ft, quarter-point
  // verticals 8 ft × (6 − 3)/12 = 2 ft.
  const p = generateProfile({
    kind: 'scissor',
    span: 32 * FT,
    pitch: 6,
    bottomPitch: 3,
    heelHeight: 0,
    overhangLeft: 0,
    overhangRight: 0,
  });
  const at = new Map(p.joints.map((j) => [j.id, j]));

  it('bottom chord rises to a bottom peak at mid-span', () => {
    const ys = p.bottomChordJoints.map((id) => at.get(id)!.y / FT);
    [0, 2, 4, 2, 0].forEach((y, i) => expect(ys[i]).toBeWithin(y, { abs: 1e-9 }));
    expect(p.rise).toBeWithin(8 * FT);
  });

  it('verticals of 2 ft, 4 ft, 2 ft', () => {
    const verticals = p.members
      .filter((m) => m.role === 'web' && Math.abs(at.get(m.from)!.x - at.get(m.to)!.x) < 1e-9)
      .map((m) => m.length / FT);
    expect(verticals).toHaveLength(3);
    [2, 4, 2].forEach((l, i) => expect(verticals[i]).toBeWithin(l, { rel: 1e-12 }));
  });

  it('two top-chord and two bottom-chord pieces, breaking at the peaks', () => {
    const bc = p.pieces.filter((x) => x.role === 'bottomChord');
    expect(bc.map((x) => x.members.length)).toEqual([2, 2]);
    expect(p.pieces.filter((x) => x.role === 'topChord')).toHaveLength(2);
  });

  it('a level bottom chord (bottomPitch 0) is one piece heel to heel', () => {
    const flat = generateProfile({
      kind: 'scissor',
      span: 16 * FT,
      pitch: 6,
      bottomPitch: 0,
      heelHeight: 0,
      overhangLeft: 0,
      overhangRight: 0,
    });
    expect(flat.pieces.filter((x) => x.role === 'bottomChord')).toHaveLength(1);
  });
});
