import { describe, expect, it } from 'vitest';
import { designTruss, type TrussDesign } from '../../../../shared/engine/design';
import { engineInput, kingPost16 } from './support/inputs';

const UPLIFT = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, windUplift: 30 };
const N_PER_LB = 4.4482216152605;

/**
 * A bottom chord that goes into compression under net uplift (0.6D + 0.6W) is checked with its
 * real bracing. NDS 2018 §3.7.1: le/d ≤ 50 (§3.7.1.4); Cp = (1+α)/(2c) − √[((1+α)/(2c))² − α/c],
 * α = FcE/Fc*, FcE = 0.822·Emin′/(le/d)², c = 0.8 (engineering.md §2). 2x4 SPF No.1/No.2:
 * Fc = 1150 psi, Emin = 510,000 psi (Supplement Table 4A), CF(Fc) = 1.15, CD = 1.6 (wind);
 * weak-axis d = 1.5 in (one ply).
 */
describe('bottom chord in compression under uplift, with and without a ceiling', () => {
  const bc = (d: TrussDesign) => d.members.find((m) => m.id === 'AB')!;

  it('the bottom chord is in compression under 0.6D + 0.6W', () => {
    // Designed inside the test: the mutation run (README) only sees engine code a test runs.
    const ceiling = designTruss(engineInput(kingPost16(UPLIFT)));
    const i = ceiling.combinations.findIndex((c) => c.name === '0.6D + 0.6W');
    expect(bc(ceiling).forces[i]).toBeLessThan(0);
    expect(bc(ceiling).bracing).toBe('Braced out of plane by the ceiling.');
  });

  it('no ceiling, bracing at the default 10 ft: le/d = 120/1.5 = 80 > 50 fails (NDS 2018 §3.7.1.4)', () => {
    const open = designTruss(engineInput({ ...kingPost16(UPLIFT), bracing: { ceiling: false } }));
    expect(bc(open).csi).toBeGreaterThanOrEqual(80 / 50 - 1e-9);
    expect(bc(open).note).toMatch(/le\/d = 80\.0 about the weak axis exceeds 50/);
    expect(bc(open).bracing).toMatch(/No ceiling: lateral bracing at 10'-0" o\.c\./);
    expect(open.ok).toBe(false);
    expect(open.notes.join(' ')).toMatch(
      /bottom chord \(no ceiling\) by lateral bracing at 10'-0"/,
    );
  });

  it('no ceiling, bracing at 6 ft: le/d = 48, Cp = 0.0844, fc/Fc′ by hand', () => {
    const open = designTruss(
      engineInput({ ...kingPost16(UPLIFT), bracing: { ceiling: false, bottomChordBracing: 72 } }),
    );
    const fcE = (0.822 * 510000) / 48 ** 2; // 181.95 psi
    const fcStar = 1150 * 1.6 * 1.15; // 2116 psi
    const alpha = fcE / fcStar;
    const h = (1 + alpha) / (2 * 0.8);
    const cp = h - Math.sqrt(h * h - alpha / 0.8);
    expect(cp).toBeWithin(0.0844, { abs: 1e-4 });
    const c = -bc(open).forces[open.combinations.findIndex((x) => x.name === '0.6D + 0.6W')];
    const ratio = c / N_PER_LB / 5.25 / (cp * fcStar);
    // The CSI is the largest ratio, so at least this compression ratio.
    expect(bc(open).csi).toBeGreaterThanOrEqual(ratio * (1 - 1e-6));
    expect(open.members.find((m) => m.id === 'AB')!.note ?? '').not.toMatch(/exceeds 50/);
  });
});

describe('named bracing', () => {
  it('purlins instead of sheathing set the top chord le and say so', () => {
    const d = designTruss(engineInput({ ...kingPost16(UPLIFT), bracing: { purlinSpacing: 24 } }));
    expect(d.members.find((m) => m.id === 'AD')!.bracing).toBe(
      `Braced out of plane by purlins at 2'-0" o.c.`,
    );
    expect(d.notes.join(' ')).toMatch(/Top chord braced out of plane by purlins at 2'-0" o\.c\./);
  });

  it('a braced web names a continuous lateral brace with diagonal bracing, or a T-brace, and where', () => {
    const d = designTruss(
      engineInput({ ...kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 }), webBraces: ['BD'] }),
    );
    const web = d.members.find((m) => m.id === 'BD')!;
    // The king post is 8 ft × 4/12 = 32 in long: mid-length is 16 in = 1'-4" from B.
    expect(web.braced).toBe(true);
    expect(web.bracing).toMatch(
      /^Continuous lateral brace \(2x4\) at mid-length, 1'-4" from joint B/,
    );
    expect(web.bracing).toMatch(/diagonal bracing/);
    expect(web.bracing).toMatch(/or a 2x4 T-brace/);
  });
});

describe('the web brace the line asks for', () => {
  const braced = (webBrace?: 'lateral' | 'tBrace') =>
    designTruss(
      engineInput({
        ...kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 }),
        webBraces: ['BD'],
        ...(webBrace && { bracing: { webBrace } }),
      }),
    ).members.find((m) => m.id === 'BD')!.bracing;

  it('a continuous lateral brace only, with its diagonal bracing', () => {
    expect(braced('lateral')).toMatch(/^Continuous lateral brace \(2x4\) at mid-length/);
    expect(braced('lateral')).toMatch(/diagonal bracing at each end\.$/);
    expect(braced('lateral')).not.toMatch(/T-brace/);
  });

  it('a T-brace only, of the web size', () => {
    expect(braced('tBrace')).toMatch(/^A 2x4 T-brace of the web's grade/);
    expect(braced('tBrace')).not.toMatch(/lateral brace/);
  });
});

/**
 * A top chord held by purlins at 48 in (no sheathing) takes CL with lu = 48 in and Cp (weak)
 * with le = 48 in; with sheathing both are braced. Hand arithmetic of NDS 2018 §3.3.3 / §3.7.1 /
 * Eq. 3.9-3 on the engine's forces (the king-post top chord is one simple span hinged at heel and
 * peak, so its span moment is its largest). 2x4 SPF No.1/No.2, D + Lr (CD = 1.25): Fc* = 1150 ×
 * 1.25 × 1.15 = 1,653.1 psi, Fb* = 875 × 1.25 × 1.5 × 1.15 = 1,886.7 psi, Emin = 510,000 psi
 * (Supplement Table 4A). lu/d = 48/3.5 = 13.7 → le = 1.63 × 48 + 3 × 3.5 = 88.74 in (Table 3.3.3);
 * RB² = 88.74 × 3.5/1.5² = 138.04; FbE = 1.2 × 510,000/138.04 = 4,433.5 psi; CL = 0.96626.
 */
describe('top chord on purlins: CL and Cp with the purlin spacing', () => {
  const loads = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };
  const csiByHand = (purlins: number) => {
    const d = designTruss(
      engineInput({
        ...kingPost16(loads),
        ...(purlins > 0 && { bracing: { purlinSpacing: purlins } }),
      }),
    );
    const tc = d.members.find((m) => m.id === 'AD')!;
    const i = d.combinations.findIndex((c) => c.name === 'D + Lr');
    const fc = -tc.forces[i] / N_PER_LB / 5.25;
    const fb = tc.maxMoment / (N_PER_LB * 25.4) / 3.0625;
    const cpOf = (fcE: number) => {
      const a = fcE / 1653.125;
      const h = (1 + a) / 1.6;
      return h - Math.sqrt(h * h - a / 0.8);
    };
    const fcE1 = (0.822 * 510000) / (tc.length / 25.4 / 3.5) ** 2;
    const cp =
      purlins > 0
        ? Math.min(cpOf(fcE1), cpOf((0.822 * 510000) / (purlins / 1.5) ** 2))
        : cpOf(fcE1);
    const cl = purlins > 0 ? 0.96626 : 1;
    const index = (fc / (cp * 1653.125)) ** 2 + fb / (cl * 1886.72 * (1 - fc / fcE1));
    return { tc, index };
  };

  it('sheathed: Eq. 3.9-3 with CL = 1', () => {
    const { tc, index } = csiByHand(0);
    expect(tc.governingCombination).toBe('D + Lr');
    expect(tc.csi).toBeWithin(index, { rel: 2e-5 });
  });

  it('purlins at 48 in: Eq. 3.9-3 with CL = 0.96626 and Cp about the weak axis (le = 48 in)', () => {
    const { tc, index } = csiByHand(48);
    expect(tc.governingCheck).toBe('compression+bending');
    expect(tc.csi).toBeWithin(index, { rel: 2e-5 });
    expect(tc.csi).toBeGreaterThan(csiByHand(0).tc.csi * 1.07);
  });
});
