import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir } from '../../../support/calculix';
import { runCalculixFrame } from '../../../support/calculixFrame';
import { designTruss } from '../../../../shared/engine/design';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { handModel } from './support/handFrame';
import { engineInput, FINK_28_OVERHANGS, SCISSOR_32 } from './support/inputs';

/**
 * Deflections between and beyond the panel points against CalculiX B31 beams with the loads
 * worked out by hand (tests/shared/engine/design/support/handFrame.ts: dead along the member,
 * roof live on the horizontal projection, the overhangs as real cantilever elements): under
 * D + Lr, the largest drop at mid-length of a bottom-chord panel, the overhang tips' movement and
 * (scissor) the roller bearing's horizontal movement, within 2 %. Only the geometry and the chosen
 * lumber come from the engine.
 */
const work = calculixWorkDir('spanwise-design-service-ccx-');

const cases: { name: string; draft: DesignInputDraft }[] = [
  { name: 'fink-overhangs-service', draft: FINK_28_OVERHANGS },
  { name: 'scissor-service', draft: SCISSOR_32 },
];

describe('mid-panel, overhang-tip and roller deflection against CalculiX (D + Lr)', () => {
  if (calculixMissing()) return;
  for (const c of cases) {
    it(`${c.name}: within 2 %`, () => {
      const input = engineInput(c.draft);
      const design = designTruss(input);
      const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
      const lumber = design.members.map((m) => m.lumber);
      const ccx = runCalculixFrame(work, c.name, handModel(profile, lumber, c.draft));
      const service = design.additional.deflection;
      expect(service.midPanel.total.load).toBe('D + Lr');

      const mid = profile.members
        .filter((m) => m.role === 'bottomChord')
        .map((m) => ({ id: m.id, drop: -ccx.midDisplacements.get(m.id)![1] }))
        .reduce((a, b) => (b.drop > a.drop ? b : a));
      expect(service.midPanel.total.max).toBeWithin(mid.drop, { rel: 0.02 });
      expect(service.midPanel.total.joint).toBe(`mid-panel of ${mid.id}`);

      const tips = [profile.topChordJoints[0], profile.topChordJoints.at(-1)!].map(
        (heel) => -ccx.displacements.get(`tip${heel}`)![1],
      );
      const tip = Math.max(...tips.map(Math.abs));
      expect(service.overhangTip!.total.max).toBeWithin(tip, { rel: 0.02 });

      if (c.draft.profile === 'scissor') {
        const pin = profile.supports.find((s) => s.type === 'pin')!.joint;
        const roller = profile.supports.find((s) => s.type === 'roller')!.joint;
        const spread = ccx.displacements.get(roller)![0] - ccx.displacements.get(pin)![0];
        expect(spread).toBeGreaterThan(0);
        expect(service.rollerMovement!.movement).toBeWithin(spread, { rel: 0.02 });
        expect(design.notes.join(' ')).toMatch(/Roller bearing .* moves .* outward/);
      } else {
        expect(service.rollerMovement).toBeUndefined();
      }
    });
  }
});
