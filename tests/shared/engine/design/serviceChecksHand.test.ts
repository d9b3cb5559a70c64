import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { caseFrameLoads, designFrame } from '../../../../shared/engine/design/frameModel';
import { solveFrame } from '../../../../shared/engine/frame';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import {
  engineInput,
  FINK_28_OVERHANGS,
  kingPost16,
  lightFink,
  SCISSOR_32,
} from './support/inputs';

/**
 * Service checks of whole designs against hand values and published rules. Everything is
 * designed inside `it` (README, mutation testing). Units lb, in.; 1 lbf = 4.4482216152605 N.
 */
const N_PER_LB = 4.4482216152605;
const NO_LOADS = { tcll: 0, tcdl: 0, bcll: 0, bcdl: 0 };

describe('mid-panel sag under a point load (AISC Manual 15th ed. Table 3-23, case 8)', () => {
  it('P at L/3 from B (2L/3 from the heel) of a hinged panel: Δ(mid) = Pa(3L² − 4a²)/(48EI) + drop at B / 2', () => {
    // The 28 ft Fink's first bottom-chord panel AB (112 in) is hinged at the heel and the splice
    // B (see serviceDeflection.test.ts). 100 lb dead load at 2 × 112/3 in from the heel (a = L/3
    // from the nearer end, B), nothing else.
    // 2x4 SPF No.1/No.2: E = 1,400,000 psi (NDS 2018 Supplement Table 4A), I = 5.359 in⁴ (Table 1B).
    const L = 112;
    const a = L / 3;
    const P = 100;
    const sag = (P * a * (3 * L * L - 4 * a * a)) / (48 * 1.4e6 * 5.359);
    expect(sag).toBeWithin(0.3323, { abs: 1e-4 });
    const d = designTruss(
      engineInput({
        ...FINK_28_OVERHANGS,
        loads: NO_LOADS,
        lumber: { bottomChord: '2x4 SPF-1/2' },
        pointLoads: [{ x: L - a, chord: 'bottom', dead: P, live: 0, kind: 'roofLive' }],
      }),
    );
    const mid = d.additional.deflection.midPanel.total;
    expect(mid.load).toBe('D');
    expect(mid.joint).toBe('mid-panel of AB');
    const b = d.deflection.bottomChord.find((x) => x.joint === 'B')!;
    // Table values (1.4e6, 5.359) are rounded: 0.1 % covers them.
    expect(mid.max / 25.4).toBeWithin(b.total / 25.4 / 2 + sag, { rel: 1e-3 });
    expect(d.additional.deflection.midPanel.live).toBeUndefined();
  });
});

describe('mid-panel deflection is the bottom chord’s (the ceiling hangs from it)', () => {
  it('a heavy roof on a king post: the top chord sags more, the check still names a bottom panel', () => {
    // TCLL 40 psf, no bottom-chord load: each top chord sags between heel and peak while the
    // unloaded bottom panels only follow their ends (common practice: the span/n limits of the
    // ceiling are checked on the bottom chord).
    const d = designTruss(engineInput(kingPost16({ tcll: 40, tcdl: 10, bcll: 0, bcdl: 0 })));
    const mid = d.additional.deflection.midPanel.total;
    const bottom = d.members.filter((m) => m.role === 'bottomChord').map((m) => m.id);
    expect(bottom).toContain(mid.joint.replace('mid-panel of ', ''));
    // The top chord's own sag, 5w⊥L⁴/(384EI) with w⊥ ≈ 91 plf over 101 in., is over an inch: a
    // mid-panel check over all chords would name a top chord.
    expect(mid.max / 25.4).toBeLessThan(0.5);
    // Not a scissor: no roller movement is reported.
    expect(d.additional.deflection.rollerMovement).toBeUndefined();
  });
});

describe('which live load the deflection checks take', () => {
  it('roof live 20 psf over snow 7 psf (pg 10, ASCE 7-16 pf = 0.7pg, Cs = 1): Lr', () => {
    const d = designTruss(
      engineInput(
        lightFink({ loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, snow: { pg: 10 } } }),
      ),
    );
    expect(d.combinations.map((c) => c.name)).toContain('D + S');
    expect(d.deflection.liveCase).toBe('Lr');
    expect(d.deflection.total.load).toBe('D + Lr');
    expect(d.additional.deflection.midPanel.live!.load).toBe('Lr');
    expect(d.additional.deflection.midPanel.total.load).toBe('D + Lr');
  });

  it('an attic load alone (IRC R301.5): L(bc)', () => {
    const d = designTruss(
      engineInput(
        lightFink({ loads: { tcll: 0, tcdl: 10, bcll: 0, bcdl: 10, bcllNonConcurrent: 10 } }),
      ),
    );
    expect(d.deflection.liveCase).toBe('L(bc)');
    expect(d.deflection.total.load).toBe('D + L(bc)');
    expect(d.additional.deflection.midPanel.live!.load).toBe('L(bc)');
  });

  it('a live point load between panel points alone still makes a live case', () => {
    const d = designTruss(
      engineInput({
        ...kingPost16({ tcll: 0, tcdl: 10, bcll: 0, bcdl: 10 }),
        pointLoads: [{ x: 48, chord: 'bottom', dead: 0, live: 200, kind: 'floor' }],
      }),
    );
    expect(d.deflection.liveCase).toBe('L');
    expect(d.deflection.live!.max).toBeGreaterThan(0);
    expect(d.deflection.total.load).toBe('D + L');
  });
});

describe('long-term deflection with dead load only (NDS 2018 §3.5.2, Kcr = 1.5)', () => {
  it('ΔT = 1.5·Δ(dead): 1.5 times the largest dead-load drop, labelled 1.5D', () => {
    const d = designTruss(engineInput(kingPost16({ tcll: 0, tcdl: 10, bcll: 0, bcdl: 10 })));
    expect(d.deflection.liveCase).toBeUndefined();
    const lt = d.additional.longTermDeflection;
    expect(lt.load).toBe('1.5D');
    expect(lt.max).toBeWithin(1.5 * d.deflection.total.max, { rel: 1e-12 });
    expect(lt.joint).toBe(d.deflection.total.joint);
    expect(lt.pass).toBe(lt.ratio >= lt.limit);
  });
});

describe('chord shear that fails (NDS 2018 §3.4.2)', () => {
  it('16 ft 4/12 king post, TCLL 80 psf: V = w⊥·L/2 = 687 lb, fv/Fv′ = 1.16 under D + Lr', () => {
    // As in chordShear.test.ts: w⊥ = TCDL·s·cosθ + TCLL·s·cos²θ, L = 8 ft / cosθ;
    // Fv′ = 135 psi × CD 1.25 (SPF No.1/No.2, Supplement Table 4A; NDS Table 2.3.2), A = 5.25 in².
    const cos = 12 / Math.hypot(12, 4);
    const w = 10 * 2 * cos + 80 * 2 * cos * cos;
    const V = (w * (8 / cos)) / 2;
    expect(V).toBeWithin(687.1, { abs: 0.1 });
    const ratio = (1.5 * V) / 5.25 / (135 * 1.25);
    const d = designTruss(engineInput(kingPost16({ tcll: 80, tcdl: 10, bcll: 0, bcdl: 0 })));
    const tc = d.additional.shear.find((c) => c.member === 'AD')!;
    expect(tc.combination).toBe('D + Lr');
    expect(tc.shear / N_PER_LB).toBeWithin(V, { rel: 1e-6 });
    expect(tc.ratio).toBeWithin(ratio, { rel: 1e-6 });
    expect(tc.pass).toBe(false);
  });
});

describe('net uplift warning', () => {
  it('names the hold-down and what it ties', () => {
    const d = designTruss(
      engineInput(kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, windUplift: 30 })),
    );
    const w = d.warnings.find((x) => x.startsWith('Net uplift at'))!;
    expect(w).toMatch(
      /under 0\.6D \+ 0\.6W; a hold-down \(uplift connector\) rated for at least this force must tie the truss to its bearing\.$/,
    );
  });
});

describe('roller movement of a scissor truss', () => {
  it('spreads outward under D + live: the frame’s Δx of the roller less the pin’s', () => {
    // A scissor's sloped bottom chords flatten under gravity and push the roller bearing out
    // (common practice: scissor trusses need a slotted or sliding bearing on one side).
    const draft: DesignInputDraft = SCISSOR_32;
    const input = engineInput(draft);
    const d = designTruss(input);
    const r = d.additional.deflection.rollerMovement!;
    const profile = generateProfile({ ...input.profile, heelHeight: d.heelHeight.analysed });
    const roller = profile.supports.find((s) => s.type === 'roller')!.joint;
    const pin = profile.supports.find((s) => s.type === 'pin')!.joint;
    expect(r.joint).toBe(roller);
    expect(r.load).toBe(d.deflection.total.load);
    const cases = designLoads(input, profile, '7-16').cases;
    const frame = designFrame(
      profile,
      d.members.map((m) => m.lumber),
      input.plies,
    );
    const live = d.deflection.liveCase === 'Lr' ? cases.Lr : cases.S;
    const result = solveFrame(
      frame,
      caseFrameLoads(profile, [
        [cases.D, 1],
        [live, 1],
      ]),
    );
    const ux = (j: string) => result.displacements.find((u) => u.joint === j)!.ux;
    const x = (j: string) => profile.joints.find((p) => p.id === j)!.x;
    const outward = Math.sign(x(roller) - x(pin));
    expect(r.movement).toBeWithin(outward * (ux(roller) - ux(pin)), { rel: 1e-9 });
    expect(r.movement).toBeGreaterThan(0);
  });
});

describe('mid-panel deflection of a scissor truss under mirrored loads', () => {
  it('a point load at x or at span − x gives the same worst mid-panel drop (symmetry)', () => {
    // A symmetric truss on a pin and a roller under vertical loads deflects symmetrically: a
    // load on the right-hand sloped bottom chord drops its panel as the mirror load does the
    // left one (the chords slope the other way: the check must take each one's downward side).
    const at = (xIn: number) =>
      designTruss(
        engineInput({
          ...SCISSOR_32,
          loads: NO_LOADS,
          lumber: { topChord: '2x6 SPF-1/2', bottomChord: '2x6 SPF-1/2', webs: '2x4 SPF-1/2' },
          pointLoads: [{ x: xIn, chord: 'bottom', dead: 400, live: 0, kind: 'roofLive' }],
        }),
      ).additional.deflection.midPanel.total;
    const left = at(32 * 3 + 10);
    const right = at(32 * 12 - (32 * 3 + 10));
    expect(left.max).toBeGreaterThan(0);
    expect(right.max).toBeWithin(left.max, { rel: 1e-6 });
    expect(right.joint).not.toBe(left.joint);
  });
});
