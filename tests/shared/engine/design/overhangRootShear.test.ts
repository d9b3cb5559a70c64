import { describe, expect, it } from 'vitest';
import { designFrame } from '../../../../shared/engine/design/frameModel';
import { memberDemands } from '../../../../shared/engine/design/demands';
import type { CombinedLoads } from '../../../../shared/engine/design/combinedLoads';
import { checkShear } from '../../../../shared/engine/members/shear';
import { generateProfile } from '../../../../shared/engine/profiles';

const N_PER_LB = 4.4482216152605;
const MM_PER_IN = 25.4;

/**
 * Shear at the overhang's root (the bearing), NDS 2018 §3.4.2: fv = 3V/(2bd). A 14 ft 6/12 king
 * post with 24 in overhangs, all 2x4 SPF No.1/No.2 (b = 1.5 in, d = 3.5 in, NDS Supplement
 * Table 1B; Fv = 135 psi, Table 4A). Only the left overhang is loaded, by w⊥ = 50 plf square to
 * it (a soffit's wind pressure, say, with the first panel unloaded), so by statics alone:
 * the overhang's root shear V = w⊥·s, its heel moment M = w⊥s²/2, and the first top-chord panel
 * AD — continuous through the heel, hinged at the peak — carries the end moment M with a constant
 * shear M/L (a beam with an end moment; L its slope length). With s < 2L the root governs.
 */
describe('overhang root shear', () => {
  const profile = generateProfile({
    kind: 'kingPost',
    span: 168 * MM_PER_IN,
    pitch: 6,
    heelHeight: 0,
    overhangLeft: 24 * MM_PER_IN,
    overhangRight: 24 * MM_PER_IN,
  });
  const left = profile.overhangs.find((o) => o.side === 'left')!;
  const k = profile.members.findIndex((m) => m.id === left.member);
  const cos = 2 / Math.sqrt(5);
  const s = 24 / cos; // in
  const L = 84 / cos; // in, heel to peak
  const w = 50 / 12; // lb/in
  const V = w * s; // 111.8 lb
  const M = (w * s * s) / 2;

  const m = profile.members.length;
  const overhangMoment = new Float64Array(m);
  overhangMoment[k] = M * N_PER_LB * MM_PER_IN;
  const combo: CombinedLoads = {
    name: 'overhang only',
    cd: 1.6,
    terms: [],
    jointLoads: [],
    transverse: new Float64Array(m),
    overhangMoment,
  };
  // Computed inside each test: the mutation run (README) only sees engine code a test runs.
  const demandsOf = () =>
    memberDemands(profile, [combo], designFrame(profile, Array(m).fill('2x4 SPF-1/2'), 1));

  it('the panel carries M/L, the root w⊥s; the member is checked with the root shear', () => {
    const demands = demandsOf();
    expect(V).toBeWithin(111.8, { abs: 0.05 });
    expect(left.slopeLength / MM_PER_IN).toBeWithin(s, { rel: 1e-9 });
    expect(M / L).toBeLessThan(V);
    expect(demands.shear[k] / N_PER_LB).toBeWithin(V, { rel: 1e-9 });
    // The unloaded right panel: no overhang moment, so only the frame's (tiny) shear.
    const right = profile.members.findIndex((mb) => mb.id === profile.overhangs[1].member);
    expect(demands.shear[right] / N_PER_LB).toBeLessThan(M / L + 1e-6);
  });

  it('fv = 3V/(2bd) = 31.9 psi against Fv′ = 135 psi × CD 1.6', () => {
    const demands = demandsOf();
    const fv = (3 * V) / (2 * 1.5 * 3.5);
    expect(fv).toBeWithin(31.94, { abs: 0.01 });
    const r = checkShear({ lumberId: '2x4 SPF-1/2', plies: 1, shear: demands.shear[k], cd: 1.6 });
    expect(r.fv / 0.00689475729).toBeWithin(fv, { rel: 1e-4 });
    expect(r.ratio).toBeWithin(fv / (135 * 1.6), { rel: 1e-4 });
  });
});
