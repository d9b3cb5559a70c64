import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, kingPost16 } from './support/inputs';

const N_PER_LB = 4.4482216152605;

/**
 * Net uplift at the bearings, by hand. A 16 ft 4/12 king-post truss at 24 in o.c., no overhang,
 * TCDL = BCDL = 10 psf, a net wind uplift of 30 psf normal to the roof. The uplift's vertical part
 * is 30 psf over the plan (normal pressure × slope length × cosθ), its horizontal parts cancel;
 * the truss is symmetric, so each bearing takes half of each. ASCE 7-16 §2.4.1 combination 7:
 * 0.6D + 0.6W.
 */
describe('net uplift at the bearings (ASCE 7-16 §2.4.1 combination 7)', () => {
  const cos = 12 / Math.hypot(12, 4);
  const dead = 10 * 2 * (16 / cos) + 10 * 2 * 16; // 657.3 lb
  const wind = 30 * 2 * 16; // 960 lb up
  const uplift = 0.6 * (wind / 2) - 0.6 * (dead / 2); // 90.8 lb
  const windy = () =>
    designTruss(engineInput(kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, windUplift: 30 })));

  it('each bearing must hold 0.6·W/2 − 0.6·D/2 = 90.8 lb down, under 0.6D + 0.6W', () => {
    expect(uplift).toBeWithin(90.8, { abs: 0.05 });
    const design = windy();
    expect(design.additional.uplift.map((u) => u.joint).sort()).toEqual(['A', 'C']);
    for (const u of design.additional.uplift) {
      expect(u.force / N_PER_LB).toBeWithin(uplift, { rel: 1e-6 });
      expect(u.combination).toBe('0.6D + 0.6W');
    }
  });

  it('says so in the warnings with the force in lb and N (a hold-down is named)', () => {
    const design = windy();
    const w = design.warnings.filter((x) => /Net uplift/.test(x));
    expect(w).toHaveLength(2);
    expect(w[0]).toContain(`${Math.round(uplift)} lb (${Math.round(uplift * N_PER_LB)} N)`);
    expect(w[0]).toMatch(/hold-down/);
  });

  it('no uplift, no warning: D + 0.6W still presses down (328.6 − 288 = 40.6 lb)', () => {
    expect(dead / 2 - 0.6 * (wind / 2)).toBeGreaterThan(0);
    const calm = designTruss(engineInput(kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 })));
    expect(calm.additional.uplift).toEqual([]);
    expect(calm.warnings.join(' ')).not.toMatch(/uplift/i);
  });
});

/**
 * Long-term deflection, NDS 2018 §3.5.2: ΔT = Kcr·ΔLT + ΔST with Kcr = 1.5 for seasoned lumber
 * in dry service; the dead load is the long-term part, the live load short-term. The frame's
 * short-term drops (checked against CalculiX and hand values elsewhere) are combined here.
 */
/** A 28 ft 4/12 Fink, 24 in o.c., TCDL 15 psf, with a total-load limit span/n. */
const fink28 = (total: number) => ({
  units: 'imperial' as const,
  profile: 'fink' as const,
  span: 28 * 12,
  pitch: 4,
  spacing: 24,
  loads: { tcll: 20, tcdl: 15, bcll: 0, bcdl: 10 },
  deflection: { live: 240, total },
});

describe('long-term deflection with creep of the dead load (NDS 2018 §3.5.2)', () => {
  // Computed inside each test (README, mutation testing).
  const at180 = () => designTruss(engineInput(fink28(180)));

  it('1.5·Δ(dead) + Δ(live), the largest over the bottom-chord panel points', () => {
    const design = at180();
    const lt = design.additional.longTermDeflection;
    const drops = design.deflection.bottomChord.map((b) => 1.5 * (b.total - b.live) + b.live);
    const max = Math.max(...drops);
    expect(lt.max).toBeWithin(max, { rel: 1e-12 });
    expect(lt.load).toBe('1.5D + Lr');
    expect(lt.limit).toBe(180);
    expect(lt.ratio).toBeWithin((28 * 12 * 25.4) / max, { rel: 1e-12 });
    // Creep adds half the dead-load drop to the short-term total.
    expect(lt.max).toBeGreaterThan(design.deflection.total.max);
  });

  // A limit between the long-term and the short-term span/Δ: short-term passes, long-term fails.
  const between = (design: ReturnType<typeof at180>) =>
    Math.floor((design.additional.longTermDeflection.ratio + design.deflection.total.ratio) / 2);

  it('a limit the long-term value misses fails the design (chords fixed), with a warning', () => {
    const design = at180();
    const limit = between(design);
    const chordOf = (role: string) => design.pieces.find((p) => p.role === role)!.lumber;
    expect(limit).toBeGreaterThan(design.additional.longTermDeflection.ratio);
    expect(limit).toBeLessThan(design.deflection.total.ratio);
    const fixed = { topChord: chordOf('topChord'), bottomChord: chordOf('bottomChord') };
    const strict = designTruss(engineInput({ ...fink28(limit), lumber: fixed }));
    expect(strict.deflection.total.pass).toBe(true);
    expect(strict.additional.longTermDeflection.pass).toBe(false);
    expect(strict.ok).toBe(false);
    expect(strict.warnings.join(' ')).toMatch(
      /Long-term deflection under 1\.5D \+ Lr \(NDS 2018 §3\.5\.2\)/,
    );
  });

  it('with lumber to choose from, sizing raises a chord until the long-term check passes', () => {
    const limit = between(at180());
    const sized = designTruss(engineInput(fink28(limit)));
    expect(sized.additional.longTermDeflection.pass).toBe(true);
    expect(sized.ok).toBe(true);
    // The worst check at the stricter limit names the raise (here mid-panel or long-term).
    expect(sized.additional.deflectionSizing?.[0].check).toMatch(/D \+ Lr at /);
    expect(sized.notes.join(' ')).toMatch(/chord: at least .* for deflection/);
  });
});
