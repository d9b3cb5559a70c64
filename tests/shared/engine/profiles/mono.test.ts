import { describe, expect, it } from 'vitest';
import { generateProfile } from '../../../../shared/engine/profiles/generate';

const FT = 304.8;
const IN = 25.4;

describe('mono', () => {
  it('rises from the low heel to a vertical at the tall end', () => {
    const p = generateProfile({
      kind: 'mono',
      span: 12 * FT,
      pitch: 3,
      heelHeight: 0,
      overhangLeft: 0,
      overhangRight: 0,
    });
    // Rise = run × pitch / 12 = 12 ft × 3/12 = 3 ft (definition of pitch).
    const tall = p.joints.find((j) => j.id === p.topChordJoints.at(-1))!;
    expect(tall.x).toBeWithin(12 * FT);
    expect(tall.y).toBeWithin(3 * FT);
    expect(p.topChordJoints[0]).toBe('A');
    const end = p.members.find((m) => m.to === tall.id && m.from === p.bottomChordJoints.at(-1));
    expect(end?.role).toBe('web');
    expect(end?.length).toBeWithin(3 * FT);
    expect(p.pieces.filter((x) => x.role === 'topChord')).toHaveLength(1);
  });

  it('with a raised heel has a heel post at the low end too', () => {
    const p = generateProfile({
      kind: 'mono',
      span: 12 * FT,
      pitch: 3,
      heelHeight: 12 * IN,
      overhangLeft: 0,
      overhangRight: 0,
    });
    const posts = p.members.filter((m) => {
      const [a, b] = [m.from, m.to].map((id) => p.joints.find((j) => j.id === id)!);
      return m.role === 'web' && a.x === b.x && (a.x === 0 || Math.abs(a.x - 12 * FT) < 1e-6);
    });
    expect(posts.map((m) => m.length)).toEqual([12 * IN, 4 * FT]);
  });
});
