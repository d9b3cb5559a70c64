import { describe, expect, it } from 'vitest';
import { DEFAULT_LUMBER, lumberCandidates } from '../../../../shared/engine/design/lumberChoice';
import { engineErrorOf } from '../analysis/support/errors';

/**
 * Candidates are tried cheapest first. Relative cost per foot = nominal board feet per foot (a
 * board foot is 144 in³ nominal: 2x4 → 8/12, 2x6 → 1, common practice) × the grade premium of
 * `lumber/cost.ts` (demo figures: SPF No.1/No.2 and SP No.2 1.0, DF-L No.2 1.05).
 */
describe('lumber candidates for a role', () => {
  it('cheapest first; equal costs keep the order given', () => {
    const got = lumberCandidates('topChord', {
      topChord: ['2x6 SPF-1/2', '2x4 DFL-2', '2x4 SPF-1/2', '2x4 SP-2'],
    });
    // 1.0, 0.70, 0.667, 0.667 per foot.
    expect(got).toEqual(['2x4 SPF-1/2', '2x4 SP-2', '2x4 DFL-2', '2x6 SPF-1/2']);
    const swapped = lumberCandidates('topChord', { topChord: ['2x4 SP-2', '2x4 SPF-1/2'] });
    expect(swapped).toEqual(['2x4 SP-2', '2x4 SPF-1/2']);
  });

  it('ids are trimmed and repeated ones tried once', () => {
    expect(lumberCandidates('web', { webs: [' 2x4 SPF-1/2', '2x4 SPF-1/2 '] })).toEqual([
      '2x4 SPF-1/2',
    ]);
  });

  it("the request's list, else the plant's default, else the built-in list", () => {
    expect(lumberCandidates('web', {}, { webs: ['2x4 SP-2'] })).toEqual(['2x4 SP-2']);
    expect(lumberCandidates('web', { webs: ['2x6 DFL-2'] }, { webs: ['2x4 SP-2'] })).toEqual([
      '2x6 DFL-2',
    ]);
    const all = lumberCandidates('bottomChord', {});
    expect([...all].sort()).toEqual([...DEFAULT_LUMBER].sort());
    expect(all[0]).toBe('2x4 SPF-1/2');
  });

  it('refuses an empty list or unknown ids, naming them', () => {
    const none = engineErrorOf(() => lumberCandidates('topChord', { topChord: [] }));
    expect([none.code, none.message, none.details]).toEqual([
      'invalid',
      'No lumber is allowed for the topChord.',
      { role: 'topChord', unknown: [] },
    ]);
    const bad = engineErrorOf(() =>
      lumberCandidates('web', { webs: ['2x4 SPF-1/2', '2x5 XX', 'foo'] }),
    );
    expect([bad.code, bad.message, bad.details]).toEqual([
      'invalid',
      'Unknown lumber for the webs: 2x5 XX, foo.',
      { role: 'web', unknown: ['2x5 XX', 'foo'] },
    ]);
  });
});
