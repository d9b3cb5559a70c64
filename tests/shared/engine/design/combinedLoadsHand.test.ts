import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads, type CombinedLoads } from '../../../../shared/engine/design/combinedLoads';
import { generateProfile } from '../../../../shared/engine/profiles';
import { KPA_PER_PSF } from '../../../../shared/engine/units';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { engineInput, kingPost16, lightFink, TYPICAL_LOADS } from './support/inputs';

/**
 * The summed combinations of `designLoads`, by hand: a combination is the sum of its cases times
 * their factors (ASCE 7-16 §2.4.1), and each case's total is the area load × spacing × the length
 * it acts on (TCDL along the slope, TCLL on plan, BCDL along the chord). Units lb, ft; the engine
 * speaks N and mm. Everything is computed inside `it` (README, mutation testing).
 */
const N_PER_LB = 4.4482216152605;
const MM_PER_FT = 304.8;
/** lb/ft → N/mm. */
const plf = (w: number) => (w * N_PER_LB) / MM_PER_FT;
const COS = 12 / Math.hypot(12, 4); // 4/12 pitch
const SPACING_FT = 2;

const loadsOf = (draft: DesignInputDraft) => {
  const input = engineInput(draft);
  const profile = generateProfile({ ...input.profile, heelHeight: 0 });
  return { profile, loads: designLoads(input, profile, '7-16') };
};
const combo = (list: CombinedLoads[], name: string) => {
  const c = list.find((x) => x.name === name);
  if (!c) throw new Error(`no combination "${name}" in ${list.map((x) => x.name)}`);
  return c;
};
const sumFy = (c: CombinedLoads) => c.jointLoads.reduce((s, l) => s + (l.fy ?? 0), 0);

describe('16 ft 4/12 king post, 20/10/0/10 psf, 24 in o.c.: combinations by hand', () => {
  // D = 10 psf × 2 ft × 2 × 8 ft / cosθ (slope) + 10 psf × 2 ft × 16 ft = 337.3 + 320 = 657.3 lb;
  // Lr = 20 psf × 2 ft × 16 ft (plan) = 640 lb.
  const dead = 10 * SPACING_FT * ((2 * 8) / COS) + 10 * SPACING_FT * 16;
  const roofLive = 20 * SPACING_FT * 16;

  it('the panel loads of each combination add up to Σ factor × case total', () => {
    expect(dead).toBeWithin(657.3, { abs: 0.05 });
    const { loads } = loadsOf(kingPost16(TYPICAL_LOADS));
    expect(loads.combinations.map((c) => [c.name, c.cd])).toEqual([
      ['D', 0.9],
      ['D + Lr', 1.25],
      ['D + 0.75Lr', 1.25],
    ]);
    for (const [name, total] of [
      ['D', dead],
      ['D + Lr', dead + roofLive],
      ['D + 0.75Lr', dead + 0.75 * roofLive],
    ] as const) {
      const c = combo(loads.combinations, name);
      expect(-sumFy(c) / N_PER_LB).toBeWithin(total, { rel: 1e-9 });
      // One entry per loaded joint: the heels, the peak and mid-span.
      expect(new Set(c.jointLoads.map((l) => l.joint)).size).toBe(c.jointLoads.length);
      expect(c.jointLoads).toHaveLength(4);
    }
  });

  it('the line load across the top chord is w·cosθ of the dead and w·cos²θ of the live load', () => {
    const { profile, loads } = loadsOf(kingPost16(TYPICAL_LOADS));
    const wDead = 10 * SPACING_FT * COS; // 18.97 plf across the chord
    const wLive = 20 * SPACING_FT * COS * COS; // 36.00 plf
    for (const [name, w] of [
      ['D + Lr', wDead + wLive],
      ['D + 0.75Lr', wDead + 0.75 * wLive],
    ] as const) {
      const c = combo(loads.combinations, name);
      profile.members.forEach((m, k) => {
        if (m.role === 'topChord') expect(c.transverse[k]).toBeWithin(plf(w), { rel: 1e-9 });
        // BCDL 10 psf × 2 ft = 20 plf square to the level bottom chord; none on the post.
        else if (m.role === 'bottomChord')
          expect(c.transverse[k]).toBeWithin(plf(20), { rel: 1e-9 });
        else expect(c.transverse[k]).toBe(0);
      });
    }
  });

  it('net uplift 30 psf normal to the roof: 0.6W pulls each heel outward by 0.6 × 80 lb', () => {
    // Normal pressure on one slope: horizontal part 30 psf × 2 ft × rise (8 ft × 4/12) = 160 lb
    // outward, half to the heel, half to the peak (where the two sides cancel). Dead load has none.
    const rise = (8 * 4) / 12;
    const { profile, loads } = loadsOf(kingPost16({ ...TYPICAL_LOADS, windUplift: 30 }));
    const c = combo(loads.combinations, '0.6D + 0.6W');
    expect(c.cd).toBe(1.6);
    const fx = (joint: string) => (c.jointLoads.find((l) => l.joint === joint)?.fx ?? 0) / N_PER_LB;
    const [left, right] = profile.supports.map((s) => s.joint);
    const xOf = (j: string) => profile.joints.find((p) => p.id === j)!.x;
    const [heelL, heelR] = xOf(left) < xOf(right) ? [left, right] : [right, left];
    expect(fx(heelL)).toBeWithin((-0.6 * 30 * SPACING_FT * rise) / 2, { rel: 1e-9 });
    expect(fx(heelR)).toBeWithin((0.6 * 30 * SPACING_FT * rise) / 2, { rel: 1e-9 });
    // Vertical: 0.6 × (30 psf × 2 ft × 16 ft on plan = 960 lb up) against 0.6 × 657.3 lb down.
    expect(sumFy(c) / N_PER_LB).toBeWithin(0.6 * 960 - 0.6 * dead, { rel: 1e-9 });
  });

  it('a point load enters each combination with its case factor (dead 100 lb, roof live 200 lb)', () => {
    const draft: DesignInputDraft = {
      ...kingPost16(TYPICAL_LOADS),
      pointLoads: [{ x: 48, chord: 'bottom', dead: 100, live: 200, kind: 'roofLive' }],
    };
    const { loads } = loadsOf(draft);
    const points = (name: string) =>
      combo(loads.combinations, name)
        .points!.map((p) => -p.fy / N_PER_LB)
        .sort((a, b) => a - b);
    const near = (a: number[], b: number[]) =>
      a.forEach((v, i) => expect(v).toBeWithin(b[i], { rel: 1e-9 }));
    expect(points('D')).toHaveLength(1);
    near(points('D'), [100]);
    near(points('D + Lr'), [100, 200]);
    near(points('D + 0.75Lr'), [100, 150]);
  });
});

describe('the overhang moment of a combination (24 ft 4/12 Fink, 12 in overhangs)', () => {
  it('D + Lr: (TCDL·s + TCLL·a)·a/2 about each heel, a = 1 ft, s = a/cosθ', () => {
    const { profile, loads } = loadsOf(lightFink());
    const a = 1;
    const dead = 10 * SPACING_FT * (a / COS); // 21.08 lb along the slope
    const live = 20 * SPACING_FT * a; // 40 lb on plan
    const expected = ((dead + live) * a) / 2; // 30.54 lb·ft
    expect(expected).toBeWithin(30.54, { abs: 0.005 });
    const c = combo(loads.combinations, 'D + Lr');
    const expected75 = ((dead + 0.75 * live) * a) / 2;
    const c75 = combo(loads.combinations, 'D + 0.75Lr');
    expect(profile.overhangs).toHaveLength(2);
    for (const o of profile.overhangs) {
      const k = profile.members.findIndex((m) => m.id === o.member);
      expect(c.overhangMoment[k] / N_PER_LB / MM_PER_FT).toBeWithin(expected, { rel: 1e-9 });
      expect(c75.overhangMoment[k] / N_PER_LB / MM_PER_FT).toBeWithin(expected75, { rel: 1e-9 });
    }
  });
});

describe('which combinations a design gets (ASCE 7-16 §2.4.1)', () => {
  it('no attic load: no "D + L(bc)" combination', () => {
    const { loads } = loadsOf(kingPost16(TYPICAL_LOADS));
    expect(loads.combinations.map((c) => c.name)).not.toContain('D + L(bc)');
    expect(loads.cases.Lbc).toBeUndefined();
    // No snow, wind or point loads: nothing assumed beyond the basic cases, so no notes.
    expect(loads.notes).toEqual([]);
  });

  const windy = (windUplift?: number) =>
    lightFink({
      overhang: 0,
      loads: {
        ...TYPICAL_LOADS,
        ...(windUplift !== undefined && { windUplift }),
        wind: { speed: 115, exposure: 'C', meanRoofHeight: 15 * 12 },
      },
    });

  it('a wind site alone: each W combination once per wind case, no plain W', () => {
    const names = designTruss(engineInput(windy())).combinations.map((c) => c.name);
    expect(names).not.toContain('0.6D + 0.6W');
    // Combinations 5 and 7 each with 8 cases (A/B, from the left/right, ±GCpi).
    expect(names.filter((n) => n.startsWith('0.6D + 0.6W['))).toHaveLength(8);
    expect(names.filter((n) => n.startsWith('D + 0.6W['))).toHaveLength(8);
    expect(names).toContain('0.6D + 0.6W[AL+]');
  });

  it('a wind site and a net uplift: the plain W stays beside the wind cases', () => {
    const names = designTruss(engineInput(windy(30))).combinations.map((c) => c.name);
    expect(names).toContain('0.6D + 0.6W');
    expect(names).toContain('0.6D + 0.6W[BR-]');
  });
});

describe('snow on a flat truss (ASCE 7-16 §7.3.4)', () => {
  it('slope 0°: the minimum pm = Is·pg = 15 psf governs pf = 0.7·15 = 10.5 psf', () => {
    const input = engineInput({
      units: 'imperial',
      profile: 'flat',
      span: 20 * 12,
      depth: 24,
      panels: 4,
      pitch: 4,
      spacing: 24,
      loads: { ...TYPICAL_LOADS, snow: { pg: 15 } },
    });
    const profile = generateProfile(input.profile);
    const loads = designLoads(input, profile, '7-16');
    expect(loads.snow! / KPA_PER_PSF).toBeWithin(15, { rel: 1e-9 });
    expect(loads.notes.join(' ')).toMatch(
      /Minimum roof snow pm = 15\.0 psf governs over ps = 10\.5 psf/,
    );
  });
});
