import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, TYPICAL_LOADS } from './support/inputs';

/**
 * A 14 ft 6/12 king post at 24 in o.c. with 20/10/0/10 psf: the cheapest top chord that passes
 * strength lets the overhang tip drop past 2a/180 under D + Lr, so sizing must raise the top
 * chord until the tip passes. The tip is then checked against a hand calculation that uses no
 * engine number but the lumber it chose:
 *
 * The top chord AD (heel A to peak D, slope length L) is one piece with the overhang, continuous
 * through the heel and hinged at the peak; the bottom chord is pinned at the heel (the heel plate
 * is not designed for moment), so the
 * overhang's moment M = w⊥s²/2 rotates the heel by ML/(3EI) (a beam pinned at the far end), its
 * own load w⊥ turns it back by w⊥L³/(24EI), and the chords' axial strain turns the whole chord AD
 * by ψ (the peak drops as the top chords shorten and the bottom chord stretches). The tip moves
 * down a·θ from the heel's rotation plus w⊥s⁴/(8EI)·cos θ from the cantilever's own bending
 * (Roark / AISC beam tables: cantilever under uniform load, beam with an end moment; from memory).
 * Values: NDS 2018 Supplement Table 4A (E: SPF No.1/No.2 1,400,000 psi, DF-L No.2 1,600,000 psi,
 * MSR 2100f-1.8E 1,800,000 psi) and Table 1B (2x4: A 5.25 in², I 5.359 in⁴; 2x6: A 8.25 in²,
 * I 20.80 in⁴).
 */
const E_PSI: Record<string, number> = {
  'SPF-1/2': 1.4e6,
  'SP-2': 1.4e6,
  'DFL-2': 1.6e6,
  'MSR-2100-1.8E': 1.8e6,
};
const SECTION: Record<string, { a: number; i: number }> = {
  '2x4': { a: 5.25, i: 5.359 },
  '2x6': { a: 8.25, i: 20.8 },
  '2x8': { a: 10.88, i: 47.63 },
};
const props = (lumber: string) => {
  const [size, grade] = lumber.split(' ');
  return { e: E_PSI[grade], ...SECTION[size] };
};

/** Tip drop (in) of a 6/12 king post, 168 in span, overhang run a (in), D + Lr = 20 + 10 psf. */
function handTip(a: number, top: string, bottom: string) {
  const cos = 2 / Math.sqrt(5);
  const t = props(top);
  const b = props(bottom);
  const ei = t.e * t.i;
  // Per inch along the slope, square to the chord: live 40 plf on plan, dead 20 plf on slope.
  const wPerp = (40 * cos * cos + 20 * cos) / 12;
  const s = a / cos;
  const L = 84 / cos;
  const M = (wPerp * s * s) / 2;
  // Bottom chord tension T from moments about the peak hinge D of everything left of the
  // vertical through D (R_A, top and ceiling loads, overhang; the web BD and the shear at B pass
  // through that vertical). M_B: the ceiling's moment over B, two spans of 84 in on rigid
  // supports, wL²/8 (B sinks a little, so slightly less; its share of the tip is < 0.1 %).
  const wTop = (40 + 20 / cos) / 12; // vertical load per inch on plan
  const wBot = 20 / 12;
  const RA = (wTop * (168 + 2 * a) + wBot * 168) / 2;
  const MB = (wBot * 84 * 84) / 8;
  const T = (84 * RA - 42 * wTop * 84 - (84 + a / 2) * wTop * a - 42 * wBot * 84 + MB) / 42;
  // Top chord compression T/cos θ (its shear's horizontal part M/L·sin θ is < 0.3 % of it).
  const epsTop = -T / cos / (t.e * t.a);
  const epsBot = T / (b.e * b.a);
  const angle = (ad: number, half: number) => Math.acos(half / ad);
  const psi = angle(L, 84) - angle(L * (1 + epsTop), 84 * (1 + epsBot));
  const heel = (M * L) / (3 * ei) - (wPerp * L ** 3) / (24 * ei) - psi;
  return a * heel + ((wPerp * s ** 4) / (8 * ei)) * cos;
}

const kingPost14 = (overhang: number) =>
  engineInput({
    units: 'imperial',
    profile: 'kingPost',
    span: 168,
    pitch: 6,
    overhang,
    spacing: 24,
    loads: TYPICAL_LOADS,
  });

describe('sizing counts the overhang-tip deflection (14 ft 6/12 king post)', () => {
  for (const a of [12, 24]) {
    describe(`${a} in overhangs`, () => {
      // Designed inside each test (README, mutation testing).
      const designed = () => {
        const design = designTruss(kingPost14(a));
        const top = design.pieces.find((p) => p.role === 'topChord')!.lumber;
        const bottom = design.pieces.find((p) => p.role === 'bottomChord')!.lumber;
        return { design, top, bottom, tip: design.additional.deflection.overhangTip! };
      };

      it('designs, with the top chord raised for the tip and that reported', () => {
        const { design, tip } = designed();
        expect(design.ok).toBe(true);
        expect(design.warnings).toEqual([]);
        expect(tip.total.pass).toBe(true);
        const raise = design.additional.deflectionSizing!.at(-1)!;
        expect(raise.group).toBe('Top chord');
        expect(raise.check).toMatch(/overhang tip/);
        expect(design.notes.join(' ')).toMatch(/Top chord: at least .* for deflection/);
      });

      it('the tip drop matches the hand calculation within 0.2 %', () => {
        const { top, bottom, tip } = designed();
        const hand = handTip(a, top, bottom);
        expect(tip.total.load).toBe('D + Lr');
        // The first panel's sag turns the heel more than the overhang's moment does: the tip
        // rises (hand < 0); the check takes the movement either way.
        expect(hand).toBeLessThan(0);
        expect(tip.total.max / 25.4).toBeWithin(-hand, { rel: 0.002 });
        expect(-hand).toBeLessThanOrEqual((2 * a) / 180);
      });

      it('the cheapest top chord, 2x4 SPF No.1/No.2, fails the tip by hand and in the engine', () => {
        const { bottom } = designed();
        expect(Math.abs(handTip(a, '2x4 SPF-1/2', bottom))).toBeGreaterThan((2 * a) / 180);
        const cheapest = designTruss({ ...kingPost14(a), lumber: { topChord: ['2x4 SPF-1/2'] } });
        expect(cheapest.additional.deflection.overhangTip!.total.pass).toBe(false);
        expect(cheapest.ok).toBe(false);
      });
    });
  }
});
