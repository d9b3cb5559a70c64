import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { generateProfile } from '../../../../shared/engine/profiles';
import { KPA_PER_PSF } from '../../../../shared/engine/units';
import { engineInput, lightFink, TYPICAL_LOADS } from './support/inputs';

const names = (draft: Parameters<typeof engineInput>[0]) =>
  designTruss(engineInput(draft)).combinations.map((c) => `${c.name} @${c.cd}`);

describe('design load combinations', () => {
  it('a non-concurrent attic load acts alone with dead load (IRC R301.5), CD 1.0', () => {
    const list = names(lightFink({ loads: { ...TYPICAL_LOADS, bcllNonConcurrent: 10 } }));
    // ASCE 7-16 §2.4.1 with D and Lr, plus D + L(bc); CD per NDS 2018 Table 2.3.2.
    expect(list).toEqual(['D @0.9', 'D + Lr @1.25', 'D + 0.75Lr @1.25', 'D + L(bc) @1']);
  });

  it('snow by ASCE 7-16 enters at 1.0 S; by 7-22 at 0.7 S', () => {
    const s16 = names(lightFink({ loads: { ...TYPICAL_LOADS, snow: { pg: 30 } } }));
    expect(s16).toContain('D + S @1.15');
    const s22 = names(
      lightFink({ loads: { ...TYPICAL_LOADS, snow: { pg: 30, edition: '7-22' } } }),
    );
    expect(s22).toContain('D + 0.7S @1.15');
  });

  it('roof snow ps = 0.7·Ce·Ct·Is·pg·Cs: pg 30 psf → 21 psf on a 4/12 warm roof (references §3)', () => {
    const input = engineInput(lightFink({ loads: { ...TYPICAL_LOADS, snow: { pg: 30 } } }));
    const profile = generateProfile({ ...input.profile, heelHeight: 0 });
    const loads = designLoads(input, profile, '7-16');
    expect(loads.snow! / KPA_PER_PSF).toBeWithin(21, { rel: 1e-9 });
  });

  it('net wind uplift lifts the heels under 0.6D + 0.6W', () => {
    const d = designTruss(engineInput(lightFink({ loads: { ...TYPICAL_LOADS, windUplift: 60 } })));
    const i = d.combinations.findIndex((c) => c.name === '0.6D + 0.6W');
    expect(d.combinations[i].cd).toBe(1.6);
    for (const r of d.reactions) {
      expect(r.vertical[i]).toBeLessThan(0);
      expect(r.maxUp).toBeWithin(-r.vertical[i], { rel: 1e-12 });
    }
  });
});

describe('web braces from the request', () => {
  it('a named web is braced whatever sizing would do; an unknown one is a warning', () => {
    const plain = designTruss(engineInput(lightFink()));
    const web = plain.members.find((m) => m.role === 'web' && !m.braced)!;
    const d = designTruss(engineInput(lightFink({ webBraces: [web.id, 'ZZ'] })));
    expect(d.members.find((m) => m.id === web.id)!.braced).toBe(true);
    expect(d.warnings).toContain('Web brace ignored, no such web in this truss: ZZ.');
    expect(d.ok).toBe(true);
  });
});
