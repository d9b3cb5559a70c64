import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { KPA_PER_PSF, MM_PER_INCH } from '../../../../shared/engine/units';
import { engineInput } from './support/inputs';

/**
 * Statics by hand ("closed form"): the design's reactions and member forces against equilibrium
 * worked out on paper from the request's numbers alone (not from the engine's load module).
 */

// psf × spacing → N/mm along the chord: 1 psf = KPA_PER_PSF kPa = KPA_PER_PSF·1e-3 N/mm².
const lineLoad = (psfValue: number, spacingIn: number) =>
  psfValue * KPA_PER_PSF * 1e-3 * spacingIn * MM_PER_INCH;

describe('reactions of a symmetric truss, closed form', () => {
  // 28 ft 6/12 Fink, 24 in o.c., 18 in overhangs each side, 10 psf TCDL, 20 psf TCLL, 10 psf BCDL.
  const spanIn = 28 * 12;
  const overhangIn = 18;
  const pitch = 6;
  // Designed inside each test (README, mutation testing).
  const designed = () =>
    designTruss(
      engineInput({
        units: 'imperial',
        profile: 'fink',
        span: spanIn,
        pitch,
        overhang: overhangIn,
        spacing: 24,
        loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
      }),
    );
  const secant = Math.hypot(12, pitch) / 12;
  const L = spanIn * MM_PER_INCH;
  const run = L + 2 * overhangIn * MM_PER_INCH; // horizontal length of the roof line
  // Working: dead on the slope = w·run·secant (top chord) + w·L (bottom chord); live on plan = w·run.
  const dead = lineLoad(10, 24) * run * secant + lineLoad(10, 24) * L;
  const roofLive = lineLoad(20, 24) * run;
  const expected: Record<string, number> = {
    D: dead,
    'D + Lr': dead + roofLive,
    'D + 0.75Lr': dead + 0.75 * roofLive,
  };

  it('has the combinations of the cases present (ASCE 7-16 §2.4.1, D and Lr only)', () => {
    const d = designed();
    expect(d.combinations.map((c) => c.name)).toEqual(Object.keys(expected));
  });

  for (const [name, total] of Object.entries(expected)) {
    it(`${name}: each reaction is half the total load, no horizontal reaction`, () => {
      const d = designed();
      const i = d.combinations.findIndex((c) => c.name === name);
      for (const r of d.reactions) {
        expect(r.vertical[i]).toBeWithin(total / 2, { rel: 1e-9 });
        expect(r.horizontal[i]).toBeWithin(0, { abs: 1e-6 * total });
      }
    });
  }

  it('reports the envelope as positive magnitudes', () => {
    const d = designed();
    for (const r of d.reactions) {
      expect(r.maxDown).toBeWithin((dead + roofLive) / 2, { rel: 1e-9 });
      expect(r.maxUp).toBe(0);
    }
  });
});

describe('king post truss under its own panel loads, closed form', () => {
  // 16 ft 4/12 king post, pointed heels, no overhang, 24 in o.c., TCDL 10 psf, BCDL 10 psf.
  const spanIn = 16 * 12;
  const designed = () =>
    designTruss(
      engineInput({
        units: 'imperial',
        profile: 'kingPost',
        span: spanIn,
        pitch: 4,
        spacing: 24,
        loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10 },
      }),
    );
  const L = spanIn * MM_PER_INCH;
  const theta = Math.atan(4 / 12);
  const s = L / 2 / Math.cos(theta); // slope length of each top chord
  const wt = lineLoad(10, 24);
  const wb = lineLoad(10, 24);
  // Panel loads by tributary length: heel gets half a top chord and half a bottom-chord panel,
  // the peak half of each top chord, mid-span half of each bottom-chord panel.
  const heel = (wt * s) / 2 + (wb * L) / 4;
  const peak = wt * s;
  const mid = (wb * L) / 2;
  const R = heel + peak / 2 + mid / 2;
  // Heel joint: ΣFy = R − heel + N_tc·sinθ = 0 → N_tc = −(R − heel)/sinθ;
  // ΣFx = N_bc + N_tc·cosθ = 0 → N_bc = (R − heel)/tanθ. Mid-span: ΣFy = N_post − mid = 0.
  const topChord = -(R - heel) / Math.sin(theta);
  const bottomChord = (R - heel) / Math.tan(theta);
  const post = mid;
  const force = (d: ReturnType<typeof designed>, role: string) =>
    d.members.filter((m) => m.role === role).map((m) => m.forces[0]);

  it('has the dead-load combination only', () => {
    const d = designed();
    expect(d.combinations.map((c) => c.name)).toEqual(['D']);
  });

  it('reactions are half the load; the king post carries between the simple and rigid shares', () => {
    const d = designed();
    // The 16 ft bottom chord is one piece, continuous over the king post: the post takes the
    // mid-span reaction of a two-span beam on an elastic support, between the simple-span share
    // wL/2 (a hinged chord) and the rigid-support share 10/8 · w·(L/2) (AISC Steel Construction
    // Manual, 15th ed., Table 3-23, continuous beam – two equal spans – uniform load).
    for (const r of d.reactions) expect(r.vertical[0]).toBeWithin(R, { rel: 1e-9 });
    expect(force(d, 'web')).toHaveLength(1);
    expect(force(d, 'web')[0]).toBeGreaterThan(post);
    expect(force(d, 'web')[0]).toBeLessThan((10 / 8) * wb * (L / 2));
    // Hinged at heel and peak, the two top chords still carry the line-model thrust within the
    // shift of the post force: both in compression, equal by symmetry.
    const [left, right] = force(d, 'topChord');
    expect(left).toBeLessThan(topChord * 0.9);
    expect(left).toBeWithin(right, { rel: 1e-9 });
    for (const f of force(d, 'bottomChord')) expect(f).toBeGreaterThan(bottomChord);
  });
});
