import { describe, expect, it } from 'vitest';
import { designInputSchema } from '../../../../shared/api/design';
import { designInputFacts, lumberFacts } from '../../../../src/components/truss/design-facts';

const input = designInputSchema.parse({
  units: 'imperial',
  profile: 'fink',
  span: 336,
  pitch: 6,
  heelHeight: 4,
  overhang: { left: 24, right: 18 },
  spacing: 24,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg: 30 } },
});

describe('designInputFacts', () => {
  it('states the truss, loads psf-first and overhangs in feet-inches', () => {
    const facts = Object.fromEntries(
      designInputFacts(input, { quantity: 14, plies: 1 }).map((f) => [f.label, f.value]),
    );
    expect(facts.Truss).toBe('Fink (W), span 28\'-0", pitch 6/12 · 14 × 1 ply');
    expect(facts.Overhangs).toBe('Left 2\'-0" · right 1\'-6"');
    expect(facts.TCLL).toBe('20 psf');
    expect(facts.Snow).toBe('Ground snow 30 psf (ASCE 7-16)');
    expect(facts.Spacing).toBe('2\'-0" o.c.');
  });
  it('falls back to the requested lumber until there is a design', () => {
    expect(lumberFacts(null, input).map((f) => f.value)).toEqual([
      'Cheapest that passes',
      'Cheapest that passes',
      'Cheapest that passes',
    ]);
  });
});
