import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir } from '../../../support/calculix';
import { runCalculixFrame } from '../../../support/calculixFrame';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { memberDemands } from '../../../../shared/engine/design/demands';
import { designFrame, frameLoadsOf } from '../../../../shared/engine/design/frameModel';
import { solveFrame } from '../../../../shared/engine/frame';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { handModel } from './support/handFrame';
import { engineInput, FINK_28_OVERHANGS, SCISSOR_32 } from './support/inputs';

/**
 * Designed trusses against CalculiX beam elements (B31, hinges by *EQUATION; see
 * tests/support/calculixFrame.ts). The loads on the CalculiX model are worked out here from the
 * request's area loads, by hand: dead load along the member, roof live load on the horizontal
 * projection, the overhang as real cantilever elements beyond the heel. Only the geometry and
 * the chosen lumber's E, b and d come from the engine. Axial forces of every member and the
 * chord moments must agree within 2 % (values under 2 % of the model's largest are compared to
 * that floor instead).
 */

const work = calculixWorkDir('spanwise-design-frame-ccx-');

interface Case {
  name: string;
  draft: DesignInputDraft;
}

const cases: Case[] = [
  { name: 'fink-overhangs', draft: FINK_28_OVERHANGS },
  {
    name: 'howe',
    draft: {
      units: 'imperial',
      profile: 'howe',
      span: 32 * 12,
      pitch: 5,
      overhang: 12,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  { name: 'scissor', draft: SCISSOR_32 },
  {
    name: 'double-fink',
    draft: {
      units: 'imperial',
      profile: 'doubleFink',
      span: 56 * 12,
      pitch: 6,
      spacing: 24,
      loads: { tcll: 35, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
  {
    name: 'fink-raised-heel',
    draft: {
      units: 'imperial',
      profile: 'fink',
      span: 28 * 12,
      pitch: 6,
      heelHeight: 12,
      overhang: 18,
      spacing: 24,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  },
];

describe('designed trusses as frames against CalculiX B31 beams (D + Lr, loads by hand)', () => {
  if (calculixMissing()) return;
  for (const c of cases) {
    it(`${c.name}: axial forces and chord moments within 2 %`, () => {
      const input = engineInput(c.draft);
      const design = designTruss(input);
      const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
      const lumber = design.members.map((m) => m.lumber);
      const combos = designLoads(input, profile, '7-16').combinations;
      const i = combos.findIndex((x) => x.name === 'D + Lr');
      expect(i).toBeGreaterThanOrEqual(0);
      const frame = designFrame(profile, lumber, input.plies);
      const demands = memberDemands(profile, combos, frame);
      const ccx = runCalculixFrame(work, c.name, handModel(profile, lumber, c.draft));

      const m = profile.members.length;
      const largestN = Math.max(
        ...profile.members.map((_, k) => Math.abs(demands.axial[i * m + k])),
      );
      const largestM = Math.max(...profile.members.map((_, k) => demands.moment[i * m + k]));
      // The engine's end moments, signed, from the same solve as its demands.
      const c0 = combos[i];
      const ends = solveFrame(
        frame,
        frameLoadsOf(profile, c0.jointLoads, c0.transverse, c0.overhangMoment),
      );
      profile.members.forEach((mb, k) => {
        const r = ccx.members.get(mb.id)!;
        expect(demands.axial[i * m + k], `${mb.id} axial`).toBeWithin(r.axial, {
          rel: 0.02,
          abs: 0.02 * largestN,
        });
        if (mb.role === 'web') return;
        const e = ends.members[k];
        expect(e.startMoment, `${mb.id} start moment`).toBeWithin(r.startMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
        expect(e.endMoment, `${mb.id} end moment`).toBeWithin(r.endMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
        expect(demands.spanMoment[i * m + k], `${mb.id} span moment`).toBeWithin(r.spanMoment, {
          rel: 0.02,
          abs: 0.02 * largestM,
        });
      });
      for (const [j, sp] of profile.supports.entries()) {
        expect(demands.ry[i * profile.supports.length + j]).toBeWithin(
          ccx.reactions.get(sp.joint)!.ry,
          {
            rel: 0.005,
          },
        );
      }
    });
  }
});
