import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir } from '../../../support/calculix';
import { runCalculixFrame, type CcxFrame } from '../../../support/calculixFrame';

/**
 * The CalculiX frame harness itself against closed forms, so that the design cross-checks
 * (tests/shared/engine/design/calculixFrame.test.ts) rest on a checked extraction of moments.
 */
const work = calculixWorkDir('spanwise-frame-ccx-');
const L = 3000;
const w = 2.5;
const section = { b: 38, d: 89, e: 9650 };

describe('CalculiX B31 frame harness against closed forms', () => {
  if (calculixMissing()) return;
  it('two equal continuous spans: support moment −wL²/8, reactions 3wL/8 and 10wL/8', () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, continuous beam – two equal spans –
    // uniform load on both spans. Shear deformation of the expanded beam (ν = 0) and the mesh
    // leave well under 1 %.
    const frame: CcxFrame = {
      joints: [0, 1, 2].map((k) => ({ id: `J${k}`, x: k * L, y: 0 })),
      members: [0, 1].map((k) => ({
        id: `M${k}`,
        from: `J${k}`,
        to: `J${k + 1}`,
        ...section,
        releaseStart: false,
        releaseEnd: false,
        wx: 0,
        wy: -w,
      })),
      supports: [
        { joint: 'J0', type: 'pin' },
        { joint: 'J1', type: 'roller' },
        { joint: 'J2', type: 'roller' },
      ],
    };
    const r = runCalculixFrame(work, 'twospan', frame);
    expect(r.reactions.get('J0')!.ry).toBeWithin((3 * w * L) / 8, { rel: 0.01 });
    expect(r.reactions.get('J1')!.ry).toBeWithin((10 * w * L) / 8, { rel: 0.01 });
    expect(r.members.get('M0')!.endMoment).toBeWithin((-w * L * L) / 8, { rel: 0.01 });
    expect(r.members.get('M1')!.startMoment).toBeWithin((-w * L * L) / 8, { rel: 0.01 });
    expect(r.members.get('M0')!.spanMoment).toBeWithin((9 * w * L * L) / 128, { rel: 0.01 });
  });

  it('a hinge by *EQUATION over the middle support gives two simple spans (wL²/8)', () => {
    const frame: CcxFrame = {
      joints: [0, 1, 2].map((k) => ({ id: `J${k}`, x: k * L, y: 0 })),
      members: [0, 1].map((k) => ({
        id: `M${k}`,
        from: `J${k}`,
        to: `J${k + 1}`,
        ...section,
        releaseStart: k === 1,
        releaseEnd: k === 0,
        wx: 0,
        wy: -w,
      })),
      supports: [
        { joint: 'J0', type: 'pin' },
        { joint: 'J1', type: 'roller' },
        { joint: 'J2', type: 'roller' },
      ],
    };
    const r = runCalculixFrame(work, 'hinged', frame);
    expect(r.reactions.get('J1')!.ry).toBeWithin(w * L, { rel: 0.01 });
    expect(r.members.get('M0')!.spanMoment).toBeWithin((w * L * L) / 8, { rel: 0.01 });
    expect(Math.abs(r.members.get('M1')!.startMoment)).toBe(0);
  });

  it('a sloped member running right to left keeps the sign: sagging + under gravity', () => {
    const frame: CcxFrame = {
      joints: [
        { id: 'A', x: 4000, y: 0 },
        { id: 'B', x: 0, y: 2000 },
      ],
      members: [
        {
          id: 'AB',
          from: 'A',
          to: 'B',
          ...section,
          releaseStart: false,
          releaseEnd: false,
          wx: 0,
          wy: -w,
        },
      ],
      supports: [
        { joint: 'A', type: 'pin' },
        { joint: 'B', type: 'roller' },
      ],
    };
    const r = runCalculixFrame(work, 'sloped', frame);
    const len = Math.hypot(4000, 2000);
    // Simple span: M = q·a²/8 with q = w·len/run per unit run over the run a = 4000.
    expect(r.members.get('AB')!.spanMoment).toBeWithin((w * len * 4000) / 8, { rel: 0.01 });
    expect(r.members.get('AB')!.startMoment).toBeWithin(0, { abs: 1e-3 * w * len * 4000 });
  });
});
