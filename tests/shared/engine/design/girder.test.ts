import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { memberDemands } from '../../../../shared/engine/design/demands';
import { designFrame } from '../../../../shared/engine/design/frameModel';
import { girderRepetitive } from '../../../../shared/engine/design/girder';
import { designPlates } from '../../../../shared/engine/design/jointPlates';
import { DEMO_PLATE_CATALOG } from '../../../../shared/engine/plates';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { engineInput } from './support/inputs';

/** A 28 ft 4/12 Fink girder, chords fixed so the fastening's lumber is known. */
const girder = (plies: number, extra: Partial<DesignInputDraft> = {}): DesignInputDraft => ({
  units: 'imperial',
  profile: 'fink',
  span: 28 * 12,
  pitch: 4,
  spacing: 24,
  plies,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
  lumber: {
    topChord: '2x6 SPF-1/2',
    bottomChord: '2x6 SPF-1/2',
    webs: ['2x4 SPF-1/2', '2x6 SPF-1/2'],
  },
  pointLoads: [{ x: 120, chord: 'bottom', dead: 1000, live: 1500, kind: 'roofLive' }],
  ...extra,
});

describe('girders: ply-to-ply fastening', () => {
  it('2-ply, one hung load: 10d common nails, 3 rows, spacing by hand from NDS 2018 §12.3.1', () => {
    const d = designTruss(engineInput(girder(2)));
    const bottom = d.plyConnections!.find((c) => c.chord === 'bottom')!;
    // Hand calculation. Load D + Lr = 1000 + 1500 = 2500 lb on one face ply; half of it passes to
    // the other ply, spread over 24 in. of chord: 1250 lb / 2 ft = 625 lb/ft.
    // 10d common nail, D = 0.148 in., Fyb = 90,000 psi; S-P-F G = 0.42 (NDS 2018 Table 12.3.3A,
    // from memory); Fe = 16,600·0.42^1.84 psi; mode IV, KD = 2.2 (NDS 2018 Eq. 12.3-6):
    const fe = 16600 * 0.42 ** 1.84;
    const z = (0.148 ** 2 / 2.2) * Math.sqrt((2 * fe * 90000) / (3 * 2));
    expect(z).toBeCloseTo(100.0, 1);
    // CD 1.25 for roof live (NDS 2018 Table 2.3.2); 3 rows in a 2x6 (common practice):
    // spacing = 3 × 100.0 × 1.25 / 625 lb/ft = 0.6 ft = 7.2 in. → 7 in.
    const spacingIn = Math.floor(((3 * z * 1.25) / 625) * 12);
    expect(spacingIn).toBe(7);
    expect(bottom).toMatchObject({ fastener: 'nail10d', rows: 3, faces: 'one face', pass: true });
    expect(bottom.spacing / 25.4).toBeCloseTo(spacingIn, 9);
    expect(bottom.combination).toBe('D + Lr');
    expect((bottom.demand * 304.8) / 4.4482216152605).toBeCloseTo(625, 6);
    expect(bottom.text).toMatch(
      /2-ply: 10d common nails \(0\.148 × 3 in\.\) in 3 rows at 7 in\. o\.c\. from one face/,
    );
    expect(d.notes.some((n) => n.includes(bottom.text))).toBe(true);
    // The top chord carries no point load: the largest nail spacing, 12 in. (common practice).
    expect(d.plyConnections!.find((c) => c.chord === 'top')!.spacing / 25.4).toBeCloseTo(12, 9);
  });

  it('3-ply nails from each face; a heavy load needs through-bolts; 4-ply is bolted', () => {
    const three = designTruss(engineInput(girder(3)));
    expect(three.plyConnections!.find((c) => c.chord === 'bottom')!.faces).toBe('each face');
    const heavy = designTruss(
      engineInput(
        girder(2, {
          pointLoads: [{ x: 120, chord: 'bottom', dead: 3000, live: 4000, kind: 'roofLive' }],
        }),
      ),
    );
    const c = heavy.plyConnections!.find((x) => x.chord === 'bottom')!;
    expect(c.fastener).toBe('bolt12');
    expect(c.faces).toBe('through all plies');
    const four = designTruss(engineInput(girder(4)));
    expect(four.plyConnections!.every((x) => x.fastener === 'bolt12')).toBe(true);
    expect(designTruss(engineInput(girder(1))).plyConnections).toBeUndefined();
  });

  it('Cr (NDS 2018 §4.3.9, at least 3 members in contact): none on a 2-ply girder, yes on 3 plies', () => {
    expect(girderRepetitive(610, 1)).toBe(true);
    expect(girderRepetitive(610, 2)).toBe(false);
    expect(girderRepetitive(610, 3)).toBe(true);
    expect(girderRepetitive(1219, 1)).toBe(false);
    const notes = designTruss(engineInput(girder(2))).notes.join(' ');
    expect(notes).toMatch(/No repetitive member factor: a 2-ply girder/);
  });

  it('plates: each ply carries 1/plies of each member force', () => {
    const input = engineInput(girder(2));
    const profile = generateProfile({ ...input.profile, heelHeight: 0 });
    const lumber = profile.members.map((m) => (m.role === 'web' ? '2x4 SPF-1/2' : '2x6 SPF-1/2'));
    const loads = designLoads(input, profile, '7-16');
    const demands = memberDemands(profile, loads.combinations, designFrame(profile, lumber, 2));
    const cds = loads.combinations.map((c) => c.cd);
    // Test-only values, triple the demo's, so one ply of this girder still finds plates.
    const strong = {
      ...DEMO_PLATE_CATALOG,
      plates: DEMO_PLATE_CATALOG.plates.map((p) => ({
        ...p,
        lateralValue: {
          aa: 3 * p.lateralValue.aa,
          ea: 3 * p.lateralValue.ea,
          ae: 3 * p.lateralValue.ae,
          ee: 3 * p.lateralValue.ee,
        },
        tensionValue: 3 * p.tensionValue,
        shearValue: 3 * p.shearValue,
      })),
    };
    const one = designPlates(profile, demands, cds, lumber, strong, 1);
    const two = designPlates(profile, demands, cds, lumber, strong, 2);
    const demandAt = (p: typeof one, j: number) => p[j].design?.members.map((m) => m.demand) ?? [];
    let compared = 0;
    for (let j = 0; j < one.length; j++) {
      if (!one[j].design || !two[j].design) continue;
      const full = Math.max(...demandAt(one, j));
      expect(Math.max(...demandAt(two, j))).toBeCloseTo(full / 2, 6);
      compared += 1;
    }
    expect(compared).toBeGreaterThan(3);
  });
});
