import { describe, expect, it } from 'vitest';
import { girderNotes, girderRepetitive } from '../../../../shared/engine/design/girder';

/**
 * What a multi-ply girder's notes tell the reader. NDS 2018 §4.3.9: the repetitive member factor
 * Cr = 1.15 needs at least 3 members in contact or at most 24 in. o.c., joined by a
 * load-distributing element (engineering.md §1, V).
 */
describe('girder notes (NDS 2018 §4.3.9)', () => {
  it('a single-ply truss has none', () => {
    expect(girderNotes(1)).toEqual([]);
  });

  it('2 plies: no Cr (fewer than 3 members), plates sized for 1/2 of each force', () => {
    const notes = girderNotes(2);
    expect(notes).toHaveLength(3);
    expect(notes[0]).toMatch(
      /^Girder of 2 plies: member capacities and stiffness with all 2 plies/,
    );
    expect(notes[0]).toMatch(
      /No repetitive member factor: a 2-ply girder has fewer than 3 members in contact \(NDS 2018 §4\.3\.9\)\.$/,
    );
    expect(notes[1]).toBe(
      'Plates: each ply is a truss of its own with plates on both faces, sized for 1/2 of each member force.',
    );
    expect(notes[2]).toMatch(/^Hung loads are taken on one face ply; .*\(n − 1\)\/n/);
    expect(girderRepetitive(24 * 25.4, 2)).toBe(false);
  });

  it('3 or 4 plies: Cr = 1.15 on chord bending', () => {
    for (const plies of [3, 4]) {
      const notes = girderNotes(plies);
      expect(notes[0]).toMatch(
        /Repetitive member factor Cr = 1\.15 on chord bending: 3 or more plies in contact/,
      );
      expect(notes[1]).toContain(`sized for 1/${plies} of each member force`);
      expect(girderRepetitive(24 * 25.4, plies)).toBe(true);
    }
  });
});
