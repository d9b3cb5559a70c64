import { describe, expect, it } from 'vitest';
import { PROFILE_KINDS } from '../../../../shared/engine/profiles/index';

describe('PROFILE_KINDS', () => {
  it('lists every kind once with a label and a one-line description', () => {
    expect(PROFILE_KINDS.map((k) => k.kind).sort()).toEqual([
      'doubleFink',
      'fan',
      'fink',
      'flat',
      'howe',
      'kingPost',
      'mono',
      'queenPost',
      'scissor',
    ]);
    for (const k of PROFILE_KINDS) {
      expect(k.label.length).toBeGreaterThan(0);
      expect(k.description).not.toMatch(/\n/);
    }
  });
});
