import { describe, expect, it } from 'vitest';
import { bracingText, chordBracingNote } from '../../../../shared/engine/design/bracing';
import type { ProfileMember } from '../../../../shared/engine/profiles/types';
import { engineInput, kingPost16 } from './support/inputs';

// The words a crew reads (common practice: sheathing and a ceiling brace the chords).
const LOADS = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };
const member = (role: ProfileMember['role']): ProfileMember => ({
  id: 'XY',
  from: 'X',
  to: 'Y',
  role,
  length: 2438.4,
});

describe('bracing in words', () => {
  it('sheathing and a ceiling: the default note and chord texts', () => {
    const input = engineInput(kingPost16(LOADS));
    expect(chordBracingNote(input)).toBe(
      'Top chord braced out of plane by the sheathing; bottom chord by the ceiling; webs over their length unless braced.',
    );
    expect(bracingText(member('topChord'), false, '2x4 SPF-1/2', input)).toBe(
      'Braced out of plane by the roof sheathing.',
    );
    expect(bracingText(member('bottomChord'), false, '2x4 SPF-1/2', input)).toBe(
      'Braced out of plane by the ceiling.',
    );
  });

  it('a web that needs no brace says so; an unknown lumber id keeps a 2x4 T-brace', () => {
    const input = engineInput(kingPost16(LOADS));
    expect(bracingText(member('web'), false, '2x6 SPF-1/2', input)).toBe(
      'No lateral brace needed.',
    );
    expect(bracingText(member('web'), true, 'not lumber', input)).toMatch(
      /; or a 2x4 T-brace of the web's grade/,
    );
    expect(bracingText(member('web'), true, '2x6 SPF-1/2', input)).toMatch(/; or a 2x6 T-brace/);
  });
});
