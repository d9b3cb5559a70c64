import { describe, expect, it } from 'vitest';
import { prepareTruss, solveLoads, unitLoadDeflection } from '../../../../shared/engine/analysis';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { axialStiffness } from '../../../../shared/engine/design/deflection';
import { profileModel } from '../../../../shared/engine/design/demands';
import {
  caseFrameLoads,
  designFrame,
  memberSection,
} from '../../../../shared/engine/design/frameModel';
import { prepareFrame, solveFrame } from '../../../../shared/engine/frame';
import { designTruss } from '../../../../shared/engine/design';
import { designValues, sectionProperties } from '../../../../shared/engine/lumber';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput, lightFink, TYPICAL_LOADS } from './support/inputs';

describe('deflection', () => {
  // Built inside each test: the mutation run (README) only sees engine code a test itself runs.
  const setup = () => {
    const input = engineInput(lightFink({ loads: { ...TYPICAL_LOADS, snow: { pg: 30 } } }));
    const d = designTruss(input);
    const profile = generateProfile({ ...input.profile, heelHeight: d.heelHeight.analysed });
    return { input, d, profile, cases: designLoads(input, profile, '7-16').cases };
  };

  it('EA is E × A × plies of the chosen lumber (NDS 2018 Supplement Table 1B section)', () => {
    const e = designValues('2x4 SPF-1/2', { cd: 1, repetitive: false }).e;
    expect(axialStiffness('2x4 SPF-1/2', 2)).toBeWithin(e * 2 * sectionProperties('2x4').area, {
      rel: 1e-12,
    });
  });

  it('uses the live case that deflects most and D plus that case for total', () => {
    const { d } = setup();
    // pg = 30 psf gives ps = 21 psf on a 4/12 warm roof (ASCE 7-16, references §3), above the
    // 20 psf roof live load: snow governs.
    expect(d.deflection.liveCase).toBe('S');
    expect(d.deflection.total.load).toBe('D + S');
    expect(d.deflection.live!.limit).toBe(240);
    expect(d.deflection.total.limit).toBe(180);
  });

  it('reports the frame Δ of D + S with the designed lumber at every bottom-chord joint', () => {
    const { input, d, profile, cases } = setup();
    const frame = designFrame(
      profile,
      d.members.map((m) => m.lumber),
      input.plies,
    );
    const result = solveFrame(
      frame,
      caseFrameLoads(profile, [
        [cases.D, 1],
        [cases.S, 1],
      ]),
    );
    for (const joint of profile.bottomChordJoints) {
      const uy = result.displacements.find((u) => u.joint === joint)!.uy;
      const reported = d.deflection.bottomChord.find((b) => b.joint === joint)!;
      expect(reported.total).toBeWithin(-uy, { rel: 1e-12, abs: 1e-12 });
    }
    expect(d.deflection.total.max).toBeGreaterThan(0);
  });

  it('with every moment released the frame Δ is the unit-load (virtual work) Δ of the truss', () => {
    const { input, d, profile, cases } = setup();
    const lumber = d.members.map((m) => m.lumber);
    const frame = prepareFrame({
      joints: profile.joints,
      supports: profile.supports,
      members: profile.members.map((m, k) => ({
        id: m.id,
        from: m.from,
        to: m.to,
        ...memberSection(lumber[k], input.plies),
        releaseStart: true,
        releaseEnd: true,
      })),
    });
    const loads = [...cases.D!.jointLoads, ...cases.S!.jointLoads];
    const truss = prepareTruss({
      ...profileModel(profile),
      members: profile.members.map((m, k) => ({
        id: m.id,
        from: m.from,
        to: m.to,
        ea: axialStiffness(lumber[k], input.plies),
      })),
    });
    const forces = solveLoads(truss, loads).members;
    const frameResult = solveFrame(frame, { joints: loads });
    for (const joint of profile.bottomChordJoints) {
      const virtualWork = unitLoadDeflection(truss, forces, joint, 'y');
      const uy = frameResult.displacements.find((u) => u.joint === joint)!.uy;
      expect(uy).toBeWithin(virtualWork, { rel: 1e-9, abs: 1e-12 });
    }
  });

  it('reports the largest drop, where, span/Δ and the pass against span/n', () => {
    const { d, profile } = setup();
    const total = d.deflection.total;
    const drops = d.deflection.bottomChord.map((b) => b.total);
    expect(total.max).toBe(Math.max(...drops));
    expect(d.deflection.bottomChord.find((b) => b.joint === total.joint)!.total).toBe(total.max);
    expect(total.ratio).toBeWithin(profile.params.span / total.max, { rel: 1e-12 });
    expect(total.pass).toBe(total.ratio >= 180);
  });

  it('a stricter limit than the truss achieves fails with a warning, not a throw', () => {
    // A flat-pitched 40 ft Fink checked at span/1200, the schema's strictest limit.
    const strict = designTruss(
      engineInput(
        lightFink({
          span: 40 * 12,
          pitch: 3,
          heelHeight: 0,
          overhang: 0,
          deflection: { live: 1200, total: 1200 },
        }),
      ),
    );
    expect(strict.ok).toBe(false);
    expect(
      strict.warnings.some((w) =>
        /^Deflection under D \+ Lr: span\/\d+ at [A-Z]+, limit span\/1200\.$/.test(w),
      ),
    ).toBe(true);
  });
});
