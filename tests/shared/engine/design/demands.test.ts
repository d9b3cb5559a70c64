import { describe, expect, it } from 'vitest';
import { chordBeams, chordMoments } from '../../../../shared/engine/design/chordBending';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { memberDemands } from '../../../../shared/engine/design/demands';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput, lightFink } from './support/inputs';

// The light Fink of common practice: 24 ft 4/12, 20/10/0/10 psf, 24 in o.c., 12 in overhangs.
const input = engineInput(lightFink());
const profile = generateProfile({ ...input.profile, heelHeight: 0 });
const loads = designLoads(input, profile, '7-16');
const demands = memberDemands(profile, loads.combinations);
const m = profile.members.length;

/** Per-member line loads and overhang moments of one unfactored case. */
function caseArrays(id: keyof typeof loads.cases) {
  const c = loads.cases[id]!;
  const t = new Float64Array(m);
  const mo = new Float64Array(m);
  const at = new Map(profile.members.map((mb, k) => [mb.id, k]));
  for (const l of c.memberLoads) t[at.get(l.member)!] += l.transverse;
  for (const o of c.overhangMoments) mo[at.get(o.member)!] += o.moment;
  return { t, mo };
}

describe('member demands with continuous chords', () => {
  it('uses the larger of the span and support moments, and no bending on webs', () => {
    for (let i = 0; i < demands.combinations; i++) {
      profile.members.forEach((mb, k) => {
        const at = i * m + k;
        expect(demands.moment[at]).toBe(
          Math.max(demands.spanMoment[at], demands.supportMoment[at]),
        );
        if (mb.role === 'web') expect(demands.moment[at]).toBe(0);
        else expect(demands.moment[at]).toBeGreaterThan(0);
      });
    }
  });

  it('combines the cases linearly with the combination factors, like the axial forces', () => {
    // Every case here is gravity, so the signed moments add as magnitudes.
    const beams = chordBeams(profile);
    const perCase = new Map(
      (['D', 'Lr'] as const).map((id) => {
        const { t, mo } = caseArrays(id);
        return [id, chordMoments(beams, t, mo)];
      }),
    );
    loads.combinations.forEach((c, i) => {
      profile.members.forEach((mb, k) => {
        if (mb.role === 'web') return;
        let support = 0;
        for (const [id, f] of c.terms) support += f * perCase.get(id as 'D' | 'Lr')!.support[k];
        expect(demands.supportMoment[i * m + k]).toBeWithin(support, { rel: 1e-9 });
      });
    });
  });

  it('is below the simple-span model max(wL²/8, overhang moment) on the top chord', () => {
    loads.combinations.forEach((c, i) => {
      profile.members.forEach((mb, k) => {
        if (mb.role !== 'topChord') return;
        const simple = Math.max(
          (Math.abs(c.transverse[k]) * mb.length ** 2) / 8,
          Math.abs(c.overhangMoment[k]),
        );
        expect(demands.moment[i * m + k]).toBeLessThan(simple);
      });
    });
  });
});
