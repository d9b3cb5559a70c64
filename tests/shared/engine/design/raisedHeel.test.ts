import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput, lightFink } from './support/inputs';

describe('raised (energy) heel', () => {
  // Common practice: a 12 in energy heel on a 28 ft 6/12 Fink, 20/10/0/10 psf, 24 in o.c.
  for (const overhang of [0, 12, 24]) {
    it(`a 12 in heel on a 28 ft Fink designs and its plates pass (overhang ${overhang} in)`, () => {
      const d = designTruss(
        engineInput(lightFink({ span: 28 * 12, pitch: 6, heelHeight: 12, overhang })),
      );
      expect(d.heelHeight.analysed).toBeWithin(12 * 25.4);
      expect(d.plates.every((p) => p.ok)).toBe(true);
      expect(d.ok).toBe(true);
      expect(d.notes.some((n) => n.startsWith('Raised heel'))).toBe(true);
    });
  }

  it("the bottom chord's end panel carries the heel's tie force", () => {
    const input = engineInput(lightFink({ span: 28 * 12, pitch: 6, heelHeight: 12 }));
    const d = designTruss(input);
    const p = generateProfile(input.profile);
    const end = p.members.find((m) => m.role === 'bottomChord')!;
    const i = d.combinations.findIndex((c) => c.name === 'D + Lr');
    const tie = d.members.find((m) => m.id === end.id)!.forces[i];
    // The end panel's tension is the horizontal thrust of the roof over the bearing: at least
    // the reaction times run over rise of the first top-chord panel's line (well above zero).
    expect(tie).toBeGreaterThan(0.5 * d.reactions[0].vertical[i]);
  });
});

describe('span and overhang input', () => {
  it('accepts a 4 ft span given in inches (the limit reached through a unit conversion)', () => {
    const d = designTruss(
      engineInput(
        lightFink({ span: 48, pitch: 4, heelHeight: 0, overhang: 0, profile: 'kingPost' }),
      ),
    );
    expect(d.span).toBeWithin(4 * 304.8);
  });

  it('on a mono truss one overhang number is the low end only', () => {
    const input = engineInput({
      units: 'imperial',
      profile: 'mono',
      span: 16 * 12,
      pitch: 4,
      overhang: 18,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    });
    expect(input.profile.overhangLeft).toBeWithin(18 * 25.4);
    expect(input.profile.overhangRight).toBe(0);
  });
});
