import { describe, expect, it } from 'vitest';
import {
  effectiveLengths,
  sizingGroups,
  sizingOptions,
} from '../../../../shared/engine/design/sizing';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput, FINK_28_OVERHANGS } from './support/inputs';

/**
 * Sizing's rules, checked against the rules themselves: NDS 2018 §3.7.1 effective lengths
 * (Ke = 1.0 for a pinned member: le = lu) and how a plant builds a truss (common practice: one
 * chord stock per chord, both top chords alike; each web on its own). Built inside each test.
 */
const fink28 = () => generateProfile({ ...engineInput(FINK_28_OVERHANGS).profile, heelHeight: 0 });

describe('effective lengths (NDS 2018 §3.7.1, Ke = 1.0)', () => {
  it('a chord: its panel in plane; out of plane its bracing spacing (0 = sheathed/ceiling)', () => {
    const p = fink28();
    const top = p.members.find((m) => m.role === 'topChord')!;
    const bottom = p.members.find((m) => m.role === 'bottomChord')!;
    const bracing = { top: 600, bottom: 3048 };
    expect(effectiveLengths(top, false, bracing)).toEqual({ leStrong: top.length, leWeak: 600 });
    expect(effectiveLengths(bottom, false, bracing)).toEqual({
      leStrong: bottom.length,
      leWeak: 3048,
    });
    // A brace is a web's: a chord ignores it.
    expect(effectiveLengths(top, true, bracing).leWeak).toBe(600);
    expect(effectiveLengths(top, false)).toEqual({ leStrong: top.length, leWeak: 0 });
    expect(effectiveLengths(bottom, false)).toEqual({ leStrong: bottom.length, leWeak: 0 });
  });

  it('a web: its length both ways; a mid-length brace halves it out of plane only', () => {
    const web = fink28().members.find((m) => m.role === 'web')!;
    expect(effectiveLengths(web, false)).toEqual({ leStrong: web.length, leWeak: web.length });
    expect(effectiveLengths(web, true, { top: 600, bottom: 600 })).toEqual({
      leStrong: web.length,
      leWeak: web.length / 2,
    });
  });
});

describe('sizing groups of the 28 ft Fink', () => {
  it('both top chords together, both bottom-chord pieces together, each web alone', () => {
    const p = fink28();
    const groups = sizingGroups(p).map((g) => ({
      label: g.label,
      role: g.role,
      pieces: g.pieces.map((x) => x.id),
      members: g.members.map((k) => p.members[k].id),
    }));
    expect(groups).toEqual([
      {
        label: 'Top chord',
        role: 'topChord',
        pieces: ['TC1', 'TC2'],
        members: ['AE', 'EF', 'FG', 'DG'],
      },
      {
        label: 'Bottom chord',
        role: 'bottomChord',
        pieces: ['BC1', 'BC2'],
        members: ['AB', 'BC', 'CD'],
      },
      { label: 'Web W1 (BE)', role: 'web', pieces: ['W1'], members: ['BE'] },
      { label: 'Web W2 (BF)', role: 'web', pieces: ['W2'], members: ['BF'] },
      { label: 'Web W3 (CF)', role: 'web', pieces: ['W3'], members: ['CF'] },
      { label: 'Web W4 (CG)', role: 'web', pieces: ['W4'], members: ['CG'] },
    ]);
  });

  it('options: a web the request braces is tried braced only', () => {
    expect(sizingOptions(['2x4 SPF-1/2', '2x6 SPF-1/2'], true, true)).toEqual([
      { lumber: '2x4 SPF-1/2', braced: true },
      { lumber: '2x6 SPF-1/2', braced: true },
    ]);
    expect(sizingOptions(['2x4 SPF-1/2'], false, false)).toEqual([
      { lumber: '2x4 SPF-1/2', braced: false },
    ]);
  });
});
