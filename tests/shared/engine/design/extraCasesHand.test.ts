import { describe, expect, it } from 'vitest';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { engineInput, TYPICAL_LOADS } from './support/inputs';

/**
 * The extra load cases of a design and the combinations they multiply into, checked against
 * ASCE 7-16 (§2.4.1 combinations, §7.6.1 unbalanced snow on hip and gable roofs, Ch. 28 wind) and
 * hand arithmetic. Built inside each test (README, mutation testing).
 */
const loadsOf = (draft: DesignInputDraft) => {
  const input = engineInput(draft);
  const profile = generateProfile({ ...input.profile, heelHeight: 0 });
  return designLoads(input, profile, '7-16');
};
const NO_LIVE = { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10 };
const gable40 = (snow: { pg: number; unbalanced?: boolean }): DesignInputDraft => ({
  units: 'imperial',
  profile: 'fink',
  span: 40 * 12,
  pitch: 6,
  overhang: 0,
  spacing: 24,
  loads: { ...NO_LIVE, snow },
});

describe('unbalanced snow (ASCE 7-16 §7.6.1: hip and gable roofs)', () => {
  it('a 40 ft 6/12 gable, pg = 30: every S combination again with each direction', () => {
    const l = loadsOf(gable40({ pg: 30 }));
    // §2.4.1 with D and S: 1 (D), 3 (D + S), 4 (D + 0.75S); S swapped for S[unbal. L/R].
    expect(l.combinations.map((c) => c.name)).toEqual([
      'D',
      'D + S',
      'D + S[unbal. L]',
      'D + S[unbal. R]',
      'D + 0.75S',
      'D + 0.75S[unbal. L]',
      'D + 0.75S[unbal. R]',
    ]);
    expect(Object.keys(l.cases).sort()).toEqual(['D', 'S', 'SuL', 'SuR']);
  });

  it('says what it applied, by hand: windward 0.3ps, leeward ps plus the drift surcharge', () => {
    // ps = 0.7·30 = 21 psf (Cs = 1 below 30°, warm roof); windward 0.3·21 = 6.3 psf;
    // hd = 0.43·∛20·⁴√(30 + 10) − 1.5 (lu = 20 ft eave to ridge), γ = 0.13·30 + 14 = 17.9 pcf,
    // surcharge hd·γ/√S = hd·γ/√2 over 8·hd·√S/3 from the ridge (S = 2 for 6/12).
    const hd = 0.43 * Math.cbrt(20) * 40 ** 0.25 - 1.5;
    const q = (hd * 17.9) / Math.SQRT2;
    const e = (8 * hd * Math.SQRT2) / 3;
    const note = loadsOf(gable40({ pg: 30 })).notes.find((n) => n.startsWith('Unbalanced'));
    expect(note).toBe(
      `Unbalanced snow (ASCE 7-16 §7.6.1), each direction as its own combinations: windward 6.3 psf, ` +
        `leeward 21.0 psf plus ${q.toFixed(1)} psf over ${e.toFixed(1)} ft from the ridge ` +
        `(hd = ${hd.toFixed(2)} ft, γ = 17.9 pcf). Labels: S[unbal. L] = wind from the left.`,
    );
  });

  it('none when the request turns it off', () => {
    const l = loadsOf(gable40({ pg: 30, unbalanced: false }));
    expect(l.cases.SuL).toBeUndefined();
    expect(l.combinations.map((c) => c.name)).toEqual(['D', 'D + S', 'D + 0.75S']);
    // Balanced snow only: nothing assumed beyond it (pf > pm here), so no notes.
    expect(l.notes).toEqual([]);
  });

  it('none on a mono (single-slope) or a flat truss: not a hip or gable roof', () => {
    const mono = loadsOf({ ...gable40({ pg: 30 }), profile: 'mono', span: 20 * 12, pitch: 4 });
    const flat = loadsOf({ ...gable40({ pg: 30 }), profile: 'flat', depth: 24, panels: 4 });
    for (const l of [mono, flat]) {
      expect(l.cases.S).toBeDefined();
      expect(l.cases.SuL).toBeUndefined();
      expect(l.combinations.map((c) => c.name)).toEqual(['D', 'D + S', 'D + 0.75S']);
    }
  });
});

describe('wind cases of the envelope procedure (ASCE 7-16 Ch. 28)', () => {
  const windy = {
    units: 'imperial',
    profile: 'fink',
    span: 24 * 12,
    pitch: 4,
    overhang: 0,
    spacing: 24,
    loads: { ...TYPICAL_LOADS, wind: { speed: 115, exposure: 'C', meanRoofHeight: 15 * 12 } },
  } as const satisfies DesignInputDraft;

  it('each combination with W once per case (A/B, left/right, ±GCpi), the rest once', () => {
    const names = loadsOf(windy).combinations.map((c) => c.name);
    // §2.4.1 with D, Lr and W: 1, 3, 4 without wind; with it 5, 6a (D + 0.45W + 0.75Lr and, with
    // no roof live, D + 0.45W) and 7, each once per wind case (8).
    expect(names.filter((n) => !n.includes('W'))).toEqual(['D', 'D + Lr', 'D + 0.75Lr']);
    expect(names).toHaveLength(3 + 4 * 8);
    expect(new Set(names).size).toBe(names.length);
    for (const w of ['AL+', 'AL-', 'AR+', 'AR-', 'BL+', 'BL-', 'BR+', 'BR-'])
      expect(names).toContain(`0.6D + 0.6W[${w}]`);
  });

  it('says how: qh by Eq. 26.10-1 in psf, the zones, GCpi and the soffit', () => {
    // qh = 0.00256·Kz·Kd·V², Kz = 2.01·(15/900)^(2/9.5) (exposure C), Kd = 0.85 → 24.5 psf.
    const qh = 0.00256 * 2.01 * (15 / 900) ** (2 / 9.5) * 0.85 * 115 ** 2;
    const note = loadsOf(windy).notes.find((n) => n.startsWith('Wind:'))!;
    expect(note).toContain(`qh = ${qh.toFixed(1)} psf (Eq. 26.10-1, Kd 0.85)`);
    expect(note).toMatch(/roof zones 2 \(windward\) and 3 \(leeward\) of Fig\. 28\.3-1/);
    expect(note).toMatch(/GCpi ±0\.18 \(enclosed\)/);
    expect(note).toMatch(/soffit GCp 0\.7 under the windward overhang/);
    expect(note).toMatch(/Labels: W\[AL\+\] = case A, wind from the left, \+GCpi\.$/);
  });
});
