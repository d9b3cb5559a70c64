import { describe, expect, it } from 'vitest';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import { jointLabel } from '../../../../shared/engine/profiles/labels';
import type { ProfileKind, ProfileParams } from '../../../../shared/engine/profiles/types';

const FT = 304.8;
const IN = 25.4;
const KINDS: ProfileKind[] = [
  'kingPost',
  'queenPost',
  'fink',
  'howe',
  'fan',
  'doubleFink',
  'scissor',
  'mono',
  'flat',
];
const params = (kind: ProfileKind, over: Partial<ProfileParams> = {}): ProfileParams => ({
  kind,
  span: 26 * FT,
  pitch: 6,
  heelHeight: 16 * IN,
  overhangLeft: 12 * IN,
  overhangRight: 12 * IN,
  bottomPitch: 3,
  depth: 36 * IN,
  panels: 10,
  ...over,
});

// The documented order (assemble.ts): bottom-chord joints left to right, then the remaining
// top-chord joints left to right; members top chord, bottom chord, then webs by mid-point x.
describe('labels and order', () => {
  it.each(KINDS)('%s: joints A, B, C … bottom chord first, then top chord', (kind) => {
    for (const heelHeight of [0, 16 * IN]) {
      const p = generateProfile(params(kind, { heelHeight }));
      expect(p.joints.map((j) => j.id)).toEqual(p.joints.map((_, i) => jointLabel(i)));
      const topOnly = p.topChordJoints.filter((id) => !p.bottomChordJoints.includes(id));
      expect([...p.bottomChordJoints, ...topOnly]).toEqual(p.joints.map((j) => j.id));
      for (const chord of [p.bottomChordJoints, p.topChordJoints]) {
        const xs = chord.map((id) => p.joints.find((j) => j.id === id)!.x);
        expect(xs).toEqual([...xs].sort((a, b) => a - b));
      }
    }
  });

  it.each(KINDS)('%s: members named by their joints in label order, unique', (kind) => {
    const p = generateProfile(params(kind));
    const rank = new Map(p.joints.map((j, i) => [j.id, i]));
    for (const m of p.members) {
      expect(m.id).toBe(m.from + m.to);
      expect(rank.get(m.from)!).toBeLessThan(rank.get(m.to)!);
    }
    expect(new Set(p.members.map((m) => m.id)).size).toBe(p.members.length);
    const roles = p.members.map((m) => m.role);
    const firstWeb = roles.indexOf('web');
    expect(roles.slice(0, firstWeb).every((r) => r !== 'web')).toBe(true);
    expect(roles.slice(firstWeb).every((r) => r === 'web')).toBe(true);
  });

  it.each(KINDS)('%s: piece marks TC…, BC…, W… in order', (kind) => {
    const p = generateProfile(params(kind));
    const marks = (prefix: string) =>
      p.pieces.filter((x) => x.id.startsWith(prefix)).map((x) => x.id);
    const tc = marks('TC');
    const bc = marks('BC');
    const w = marks('W');
    expect(p.pieces.map((x) => x.id)).toEqual([...tc, ...bc, ...w]);
    expect(tc).toEqual(tc.map((_, i) => `TC${i + 1}`));
    expect(bc).toEqual(bc.map((_, i) => `BC${i + 1}`));
    expect(w).toEqual(p.members.filter((m) => m.role === 'web').map((_, i) => `W${i + 1}`));
  });

  it('labels run past Z to AA, AB … with unique member ids (flat, 40 panels)', () => {
    const p = generateProfile(params('flat', { span: 60 * FT, panels: 40 }));
    expect(p.joints).toHaveLength(82);
    expect(p.joints[26].id).toBe('AA');
    expect(p.joints.at(-1)!.id).toBe('CD');
    expect(new Set(p.members.map((m) => m.id)).size).toBe(p.members.length);
  });

  it('a 24 ft Fink with a pointed heel is labelled A–D along the bottom, E–G along the top', () => {
    const p = generateProfile(params('fink', { span: 24 * FT, pitch: 4, heelHeight: 0 }));
    expect(p.bottomChordJoints).toEqual(['A', 'B', 'C', 'D']);
    expect(p.topChordJoints).toEqual(['A', 'E', 'F', 'G', 'D']);
    expect(p.members.map((m) => m.id)).toEqual([
      'AE',
      'EF',
      'FG',
      'DG',
      'AB',
      'BC',
      'CD',
      'BE',
      'BF',
      'CF',
      'CG',
    ]);
  });
});
