import { describe, expect, it } from 'vitest';
import { loadCombinations } from '../../../../shared/engine/loads';

const names = (xs: { name: string }[]) => xs.map((x) => x.name);

describe('ASD load combinations, ASCE 7-16 §2.4.1 (engineering.md §3, V2)', () => {
  it('all cases present: eqs 1–7 without R and E', () => {
    const combos = loadCombinations(['D', 'L', 'Lr', 'S', 'W']);
    expect(names(combos)).toEqual([
      'D',
      'D + L',
      'D + Lr',
      'D + S',
      'D + 0.75L + 0.75Lr',
      'D + 0.75L + 0.75S',
      'D + 0.6W',
      'D + 0.75L + 0.45W + 0.75Lr',
      'D + 0.75L + 0.45W + 0.75S',
      '0.6D + 0.6W',
    ]);
  });

  it('CD is the shortest-duration load present (NDS 2018 Table 2.3.2)', () => {
    const cd = Object.fromEntries(
      loadCombinations(['D', 'L', 'Lr', 'S', 'W']).map((c) => [c.name, c.cd]),
    );
    expect(cd).toMatchObject({
      D: 0.9,
      'D + L': 1.0,
      'D + S': 1.15,
      'D + Lr': 1.25,
      'D + 0.75L + 0.75S': 1.15,
      '0.6D + 0.6W': 1.6,
    });
  });

  it('skips combinations whose variable loads are all absent', () => {
    expect(names(loadCombinations(['D']))).toEqual(['D']);
    expect(names(loadCombinations(['D', 'Lr']))).toEqual(['D', 'D + Lr', 'D + 0.75Lr']);
    const snowOnly = names(loadCombinations(['S']));
    expect(snowOnly).toEqual(['D', 'D + S', 'D + 0.75S']);
  });

  it('factors are stored per case', () => {
    const c = loadCombinations(['D', 'L', 'S', 'W']).find(
      (x) => x.name === 'D + 0.75L + 0.45W + 0.75S',
    );
    expect(c?.factors).toEqual({ D: 1, L: 0.75, W: 0.45, S: 0.75 });
  });

  it('ASCE 7-22 enters snow as 0.7S (structuremag.org, V)', () => {
    const n = names(loadCombinations(['D', 'L', 'S', 'W'], { edition: '7-22' }));
    expect(n).toContain('D + 0.7S');
    expect(n).toContain('D + 0.75L + 0.525S');
    expect(n).toContain('D + 0.75L + 0.45W + 0.525S');
  });

  it('non-concurrent bottom-chord live (IRC R301.5) is its own D + L(bc)', () => {
    const combos = loadCombinations(['D', 'L', 'Lr'], { nonConcurrentBottomChordLive: true });
    expect(names(combos)).toEqual(['D', 'D + Lr', 'D + 0.75Lr', 'D + L(bc)']);
    expect(combos.at(-1)).toMatchObject({ factors: { D: 1, L: 1 }, cd: 1.0 });
  });

  it('refuses an unknown case', () => {
    expect(() => loadCombinations(['D', 'E' as never])).toThrow(/Unknown load case/);
  });
});
