import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, kingPost16 } from './support/inputs';

const N_PER_LB = 4.4482216152605;
const kingPost = (bcdl: number) =>
  designTruss(engineInput(kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl })));

/**
 * Chord shear on a whole design, computed here by hand. A 16 ft 4/12 king-post truss with no
 * overhang: each top chord is one piece from heel to peak, hinged at both ends (heel without an
 * overhang, peak), so it spans as a simple beam and V = w⊥·L/2 at its ends. Dead load acts along
 * the slope (TCDL·s per ft of slope), roof live load on the horizontal projection (TCLL·s per ft
 * of plan = TCLL·s·cosθ per ft of slope); the part across the chord is w·cosθ of each.
 * NDS 2018 §3.4.2: fv = 1.5V/A; Fv′ = Fv·CD, Fv = 135 psi for SPF No.1/No.2 (Supplement Table 4A),
 * CD 0.9 (D) and 1.25 (Lr) (NDS 2018 Table 2.3.2). Units lb, ft, in.
 */
describe('top-chord shear of a king-post truss (NDS 2018 §3.4.2)', () => {
  const s = 2; // ft, 24 in o.c.
  const cos = 12 / Math.hypot(12, 4);
  const slope = 8 / cos; // ft, heel to peak
  const dead = 10 * s * cos; // plf across the chord
  const live = 20 * s * cos * cos;
  const vD = (dead * slope) / 2; // 80.0 lb
  const vDLr = ((dead + live) * slope) / 2; // 231.8 lb

  it('V under D + Lr is (w⊥D + w⊥Lr)·L/2 = 231.8 lb, and it governs', () => {
    const design = kingPost(10);
    expect(vDLr).toBeWithin(231.8, { abs: 0.05 });
    const tc = design.additional.shear.find((c) => c.member === 'AD')!;
    expect(tc.combination).toBe('D + Lr');
    expect(tc.shear / N_PER_LB).toBeWithin(vDLr, { rel: 1e-6 });
    const ratio = (1.5 * vDLr) / 5.25 / (135 * 1.25);
    expect(tc.ratio).toBeWithin(ratio, { rel: 1e-6 });
    expect(tc.pass).toBe(true);
  });

  it("the member's shear envelope is the D + Lr value; D alone (80.0 lb at CD 0.9) does not govern", () => {
    const design = kingPost(10);
    expect(vD).toBeWithin(80.0, { abs: 0.05 });
    const ad = design.members.find((m) => m.id === 'AD')!;
    expect(ad.maxShear / N_PER_LB).toBeWithin(vDLr, { rel: 1e-6 });
    expect((1.5 * vD) / 5.25 / (135 * 0.9)).toBeLessThan((1.5 * vDLr) / 5.25 / (135 * 1.25));
  });

  it('says how shear is checked, and webs carry none', () => {
    const design = kingPost(10);
    expect(design.notes.join(' ')).toMatch(/NDS 2018 §3\.4\.2/);
    expect(design.additional.shear.map((c) => c.member)).not.toContain('BD');
  });
});

/**
 * Heel plate steel on a whole design, by hand (method of joints). A 16 ft 4/12 king-post truss
 * with no bottom-chord load and no overhang: each side's top chord carries W = TCDL·s·L_slope +
 * TCLL·s·8 ft; half of it goes to the heel joint, the bearing takes W, so the top-chord force at
 * mid-length is C = (W − W/2)/sinθ = W/(2 sinθ). The heel steel along the bottom chord carries
 * C·cosθ in shear and C·sinθ in tension, with the full force of the worst combination (steel
 * takes no CD), not C/CD. The frame's bottom chord is continuous through the king post, so as the
 * peak settles it bends and the post carries a few pounds: the frame's C is within 1 % of the
 * pin-jointed value (a 25 % CD slip could not hide in that).
 */
describe('heel plate steel with the full force (king post, method of joints)', () => {
  const cos = 12 / Math.hypot(12, 4);
  const sin = 4 / Math.hypot(12, 4);
  const w = 10 * 2 * (8 / cos) + 20 * 2 * 8; // 488.6 lb under D + Lr
  const c = w / (2 * sin);

  it('the top chord carries C = W/(2 sinθ) = 772.6 lb under D + Lr', () => {
    const design = kingPost(0);
    expect(c).toBeWithin(772.6, { abs: 0.05 });
    const ad = design.members.find((m) => m.id === 'AD')!;
    expect(ad.maxCompression / N_PER_LB).toBeWithin(c, { rel: 0.01 });
  });

  it('the heel steel takes C·cosθ (shear) and C·sinθ (tension), not divided by CD 1.25', () => {
    const design = kingPost(0);
    const heel = design.plates.find((p) => p.joint === 'A')!;
    expect(heel.kind).toBe('heel');
    const shear = heel.design!.steel.find((s) => s.kind === 'shear')!;
    const tension = heel.design!.steel.find((s) => s.kind === 'tension')!;
    expect(shear.demand / N_PER_LB).toBeWithin(c * cos, { rel: 0.01 });
    expect(tension.demand / N_PER_LB).toBeWithin(c * sin, { rel: 0.01 });
    const ad = design.members.find((m) => m.id === 'AD')!;
    expect(shear.demand).toBeWithin(ad.maxCompression * cos, { rel: 1e-9 });
    // Tooth holding is checked with the chord's end force over CD: its axial force C and its end
    // shear V = (W/2)·cosθ (a simple span hinged at heel and peak carries half its load square to
    // it at each end) as one vector, √(772.6² + 231.8²)/1.25 = 806.6/1.25 = 645.3 lb at
    // atan(231.8/772.6) = 16.7° to the grain.
    const v = (w / 2) * cos;
    expect(v).toBeWithin(231.8, { abs: 0.05 });
    const tooth = heel.design!.members.find((m) => m.member === 'AD')!;
    expect(tooth.demand / N_PER_LB).toBeWithin(Math.hypot(c, v) / 1.25, { rel: 0.01 });
    expect(tooth.loadToGrain).toBeWithin(Math.atan2(v, c), { rel: 0.02 });
  });
});
