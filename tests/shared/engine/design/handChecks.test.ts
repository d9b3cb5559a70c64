import { describe, expect, it } from 'vitest';
import { designTruss, type TrussDesign } from '../../../../shared/engine/design';
import { engineInput, lightFink } from './support/inputs';

/**
 * Design-level hand calculations, computed here from the inputs and published rules without the
 * engine's loads, lumber or member code: statics of a symmetric simply supported truss (each
 * bearing takes half the gravity load), ASCE 7-16 Ch. 7 snow, NDS 2018 bearing. Units: lb, ft,
 * psf, psi. Forces come back from the engine in N: 1 lbf = 4.4482216152605 N (exact).
 */
const N_PER_LB = 4.4482216152605;
const lb = (n: number) => n / N_PER_LB;
const deg = (risePer12: number) => (Math.atan(risePer12 / 12) * 180) / Math.PI;
/** Truss spacing 24 in. = 2 ft; 24 ft span with 1 ft overhangs each side → 26 ft of top chord run. */
const SPACING_FT = 2;

const combo = (d: TrussDesign, name: string) => {
  const i = d.combinations.findIndex((c) => c.name === name);
  if (i < 0) throw new Error(`no combination "${name}" in ${d.combinations.map((c) => c.name)}`);
  return i;
};
/** Vertical reaction (lb, up +) at the first bearing under a combination. */
const reaction = (d: TrussDesign, name: string) => lb(d.reactions[0].vertical[combo(d, name)]);

describe('sloped-roof snow on the design (ASCE 7-16 Eq. 7.3-1, 7.4-1, Fig. 7.4-1)', () => {
  const pg = 30; // psf; Ce = Ct = Is = 1.0 → pf = 0.7·30 = 21.0 psf (engineering.md §3, C)
  const pf = 0.7 * pg;

  it('a steep 12/12 roof (45°), warm, other surface: Cs = 1 − (45 − 30)/40 = 0.625', () => {
    const d = designTruss(
      engineInput(
        lightFink({
          pitch: 12,
          loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg } },
        }),
      ),
    );
    const cs = 1 - (45 - 30) / 40;
    const ps = cs * pf; // 13.125 psf on the horizontal projection
    const snowReaction = (ps * SPACING_FT * 26) / 2; // 341.25 lb
    expect(snowReaction).toBeWithin(341.25, { rel: 1e-12 });
    expect(reaction(d, 'D + S') - reaction(d, 'D')).toBeWithin(snowReaction, { rel: 1e-6 });
    expect(d.notes.join(' ')).toMatch(/13\.1 psf/);
  });

  it('a slippery 6/12 roof (26.57°), warm: Cs = 1 − (θ − 5)/65 = 0.668, ps = 14.0 psf', () => {
    const d = designTruss(
      engineInput(
        lightFink({
          pitch: 6,
          loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg, slippery: true } },
        }),
      ),
    );
    const cs = 1 - (deg(6) - 5) / 65;
    expect(cs).toBeWithin(0.668, { abs: 5e-4 });
    const snowReaction = (cs * pf * SPACING_FT * 26) / 2;
    expect(reaction(d, 'D + S') - reaction(d, 'D')).toBeWithin(snowReaction, { rel: 1e-6 });
  });

  it('the same 6/12 roof not slippery keeps Cs = 1.0 (θ < 30°): ps = pf = 21.0 psf', () => {
    const d = designTruss(
      engineInput(
        lightFink({ pitch: 6, loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg } } }),
      ),
    );
    expect(reaction(d, 'D + S') - reaction(d, 'D')).toBeWithin((pf * SPACING_FT * 26) / 2, {
      rel: 1e-6,
    });
  });
});

describe('dead load, the statics every other check rests on', () => {
  it('TCDL along the slope, BCDL along the chord: 24 ft 4/12 Fink, 1 ft overhangs', () => {
    const d = designTruss(engineInput(lightFink()));
    const slope = Math.hypot(1, 4 / 12);
    const dead = 10 * SPACING_FT * 26 * slope + 10 * SPACING_FT * 24; // 548.1 + 480 lb
    expect(reaction(d, 'D')).toBeWithin(dead / 2, { rel: 1e-6 });
    expect(reaction(d, 'D + Lr') - reaction(d, 'D')).toBeWithin((20 * SPACING_FT * 26) / 2, {
      rel: 1e-6,
    });
  });
});

describe('a scissor truss with bottom-chord live load (IRC R301.5 attic load)', () => {
  it('BCLL acts on the horizontal projection of the sloped bottom chord, not along it', () => {
    // 30 ft scissor 6/12 over 3/12, 24 in o.c., BCLL 20 psf: each bearing takes
    // 20 · 2 · 30 / 2 = 600 lb. Along the 3/12 slope it would be 600 · 1.0308 = 618.5 lb.
    const d = designTruss(
      engineInput({
        units: 'imperial',
        profile: 'scissor',
        span: 30 * 12,
        pitch: 6,
        bottomPitch: 3,
        overhang: 0,
        loads: { tcll: 0, tcdl: 10, bcll: 20, bcdl: 10 },
      }),
    );
    expect(reaction(d, 'D + L') - reaction(d, 'D')).toBeWithin(600, { rel: 1e-6 });
    // BCDL (ceiling weight) does act along the sloped chord: 10 · 2 · 30 · √(1 + (3/12)²).
    const tc = 10 * SPACING_FT * 30 * Math.hypot(1, 6 / 12);
    const bc = 10 * SPACING_FT * 30 * Math.hypot(1, 3 / 12);
    expect(reaction(d, 'D')).toBeWithin((tc + bc) / 2, { rel: 1e-6 });
  });
});

describe('a bearing that fails (NDS 2018 3.10.2, Fc⊥ of Table 4A)', () => {
  it('is checked with the governing total reaction, not the dead-load one', () => {
    // 24 ft 4/12 Fink, 20/10/0/10 psf, 1.5 in bearing at the heel (Cb = 1.0, NDS 3.10.4).
    // D + Lr reaction = (548.1 + 480)/2 + 20·2·26/2 = 1,034.1 lb; SPF No.1/No.2 Fc⊥ = 425 psi on
    // 1.5 × 1.5 in. → capacity 956.25 lb → ratio 1.081 (fails). Dead load alone: 0.54 (passes).
    const d = designTruss(
      engineInput(
        lightFink({
          bearingWidth: 1.5,
          lumber: { bottomChord: '2x4 SPF-1/2' },
        }),
      ),
    );
    const slope = Math.hypot(1, 4 / 12);
    const total = (10 * SPACING_FT * 26 * slope + 10 * SPACING_FT * 24) / 2 + 20 * SPACING_FT * 13;
    const capacity = 425 * 1.5 * 1.5;
    for (const b of d.bearing) {
      expect(lb(b.reaction)).toBeWithin(total, { rel: 1e-6 });
      expect(b.ratio).toBeWithin(total / capacity, { rel: 1e-6 });
      expect(b.pass).toBe(false);
    }
    expect(d.ok).toBe(false);
    expect(d.warnings.some((w) => /^Bearing at A/.test(w))).toBe(true);
  });
});

describe('spacing over 24 in. o.c.: no repetitive member factor (NDS 2018 4.3.9)', () => {
  // The same line loads on the chords two ways: 24 in. o.c. at q, and 48 in. o.c. at q/2. Forces
  // and moments are then identical, so only Cr = 1.15 on Fb can differ.
  const lumber = { topChord: '2x4 SPF-1/2', bottomChord: '2x4 SPF-1/2', webs: '2x4 SPF-1/2' };
  const at24 = designTruss(
    engineInput(lightFink({ lumber, loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 } })),
  );
  const at48 = designTruss(
    engineInput(lightFink({ lumber, spacing: 48, loads: { tcll: 10, tcdl: 5, bcll: 0, bcdl: 5 } })),
  );

  it('carries the same forces', () => {
    at24.members.forEach((m, k) =>
      m.forces.forEach((f, i) => expect(at48.members[k].forces[i]).toBeWithin(f, { abs: 1e-6 })),
    );
  });

  it('bending chords lose the 1.15: fb/Fb′ grows by exactly 15 %', () => {
    const sx = (1.5 * 3.5 ** 2) / 6; // 2x4, in³ (NDS Supplement Table 1B: 3.063)
    let checked = 0;
    at24.members.forEach((m, k) => {
      const m48 = at48.members[k];
      if (m.role !== 'bottomChord' || m.governingCheck !== 'tension+bending') return;
      if (m48.governingCombination !== m.governingCombination) return;
      // tension + bending (NDS 3.9.1): CSI = ft/Ft′ + fb/Fb′; only the fb/Fb′ term changes.
      const cd = at24.combinations.find((c) => c.name === m.governingCombination)!.cd;
      const fb = lb(m.maxMoment) / 25.4 / sx; // psi (N·mm → lb·in)
      const bendingAt48 = fb / (875 * cd * 1.5); // SPF Fb 875 psi, CF 1.5, no Cr
      expect(m48.csi - m.csi).toBeWithin(bendingAt48 * (1 - 1 / 1.15), { rel: 1e-3 });
      checked += 1;
    });
    expect(checked).toBeGreaterThan(0);
  });

  it('webs (no bending) do not change, and the notes say why the chords do', () => {
    at24.members.forEach((m, k) => {
      if (m.role === 'web') expect(at48.members[k].csi).toBeWithin(m.csi, { rel: 1e-9 });
    });
    expect(at48.notes.join(' ')).toMatch(/No repetitive member factor/);
    expect(at24.notes.join(' ')).toMatch(/Cr = 1\.15/);
  });
});

describe('minimum and unbalanced snow on the design (ASCE 7-16 §7.3.4, §7.6.1), by hand', () => {
  it('a 3/12 roof with pg = 15 psf carries pm = 15 psf, not pf = 10.5 psf', () => {
    const d = designTruss(
      engineInput(
        lightFink({ pitch: 3, loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg: 15 } } }),
      ),
    );
    expect(reaction(d, 'D + S') - reaction(d, 'D')).toBeWithin((15 * SPACING_FT * 26) / 2, {
      rel: 1e-6,
    });
    expect(d.notes.join(' ')).toMatch(/Minimum roof snow pm = 15\.0 psf/);
  });

  it('40 ft 6/12 Fink, pg = 30: unbalanced reactions by statics, both directions', () => {
    const d = designTruss(
      engineInput({
        units: 'imperial',
        profile: 'fink',
        span: 40 * 12,
        pitch: 6,
        overhang: 0,
        loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg: 30 } },
      }),
    );
    // Wind from the left: 6.3 psf on x = 0–20 ft, 21 psf on 20–40 ft, surcharge
    // hd·γ/√2 over 8·hd·√2/3 from the ridge (see tests/shared/engine/loads/snowCases.test.ts).
    const hd = 0.43 * Math.cbrt(20) * 40 ** 0.25 - 1.5;
    const q = (hd * 17.9) / Math.SQRT2;
    const e = (8 * hd * Math.SQRT2) / 3;
    const loads: [number, number][] = [
      [6.3 * SPACING_FT * 20, 10],
      [21 * SPACING_FT * 20, 30],
      [q * SPACING_FT * e, 20 + e / 2],
    ];
    const total = loads.reduce((s, [f]) => s + f, 0);
    const right = loads.reduce((s, [f, x]) => s + (f * x) / 40, 0);
    const left = total - right;
    const i = combo(d, 'D + S[unbal. L]');
    const j = combo(d, 'D + S[unbal. R]');
    const dead = d.combinations.findIndex((c) => c.name === 'D');
    const r = (k: number, at: number) =>
      lb(d.reactions[k].vertical[at] - d.reactions[k].vertical[dead]);
    expect(r(0, i)).toBeWithin(left, { rel: 1e-6 });
    expect(r(1, i)).toBeWithin(right, { rel: 1e-6 });
    expect(r(0, j)).toBeWithin(right, { rel: 1e-6 });
    expect(r(1, j)).toBeWithin(left, { rel: 1e-6 });
    expect(d.combinations.map((c) => c.name)).toContain('D + S');
  });
});

/** The 24 ft 4/12 Fink at 115 mph, exposure C, h = 15 ft, with the given overhangs (in.). */
const windFink = (overhang: number) =>
  designTruss(
    engineInput(
      lightFink({
        overhang,
        loads: {
          tcll: 20,
          tcdl: 10,
          bcll: 0,
          bcdl: 10,
          wind: { speed: 115, exposure: 'C', meanRoofHeight: 15 * 12 },
        },
      }),
    ),
  );

/**
 * Its pressures by hand: qh = 0.00256·Kz·Kd·V² (ASCE 7-16 Eq. 26.10-1, Kz 2.01(15/900)^(2/9.5),
 * Kd 0.85), roof zones 2/3 of Fig. 28.3-1 (from memory) at θ = 18.4°, net of +GCpi = 0.18;
 * pw windward, pl leeward, psf, + toward the roof.
 */
const windByHand = () => {
  const qh = 0.00256 * 2.01 * (15 / 900) ** (2 / 9.5) * 0.85 * 115 ** 2;
  const zone3 = -0.37 - (0.11 * (deg(4) - 5)) / 15;
  return { qh, zone3, pw: qh * (-0.69 - 0.18), pl: qh * (zone3 - 0.18) };
};

describe('wind on the design (ASCE 7-16 Ch. 28 envelope), by hand', () => {
  it('24 ft 4/12 Fink, no overhang, 115 mph, exposure C, h = 15 ft: case A from the left, +GCpi', () => {
    const d = windFink(0);
    const { pw, pl } = windByHand();
    // Normal pressure on a slope: its vertical part per unit horizontal run is p; its horizontal
    // part per unit rise is p. Run 12 ft each side, rise 4 ft, spacing 2 ft.
    const up = -(pw + pl) * 12 * SPACING_FT;
    const i = combo(d, 'D + 0.6W[AL+]');
    const dead = combo(d, 'D');
    const sumV = (k: number) => lb(d.reactions[0].vertical[k] + d.reactions[1].vertical[k]);
    expect(sumV(dead) - sumV(i)).toBeWithin(0.6 * up, { rel: 1e-6 });
    // Horizontal: windward suction pulls the left slope up-left, leeward suction the right slope
    // up-right; the pin at the left heel takes the difference.
    const fx = (pw - pl) * 4 * SPACING_FT; // |pw|·rise toward −x, |pl|·rise toward +x
    const h = d.reactions.reduce((s, r) => s + lb(r.horizontal[i]), 0);
    expect(h).toBeWithin(-0.6 * fx, { rel: 1e-6 });
    expect(d.notes.join(' ')).toMatch(/Ch\. 28 envelope/);
    expect(d.combinations.filter((c) => /W\[/.test(c.name)).length).toBeGreaterThanOrEqual(16);
  });

  // A truss with overhangs under wind (engine 1.4.1: the overhang-only wind loads used to drop the
  // member the overhang continues, and every design with an overhang and a wind site was refused).
  // 12 in. overhangs: the overhang top takes qh·GCpf only and the windward soffit qh·0.7 upward
  // (§28.3.3, from memory). Vertical per unit horizontal run: p.
  it('with 12 in. overhangs: the uplift includes the overhangs and the windward soffit', () => {
    const d = windFink(12);
    const { qh, zone3, pw, pl } = windByHand();
    // 12 ft of roof and 1 ft of overhang each side, 2 ft spacing (lb, + up).
    const up = (-(pw + pl) * 12 - qh * (-0.69 + zone3) * 1 + 0.7 * qh * 1) * SPACING_FT;
    const sumV = (k: number) => lb(d.reactions[0].vertical[k] + d.reactions[1].vertical[k]);
    expect(sumV(combo(d, 'D')) - sumV(combo(d, 'D + 0.6W[AL+]'))).toBeWithin(0.6 * up, {
      rel: 1e-6,
    });
  });
});
