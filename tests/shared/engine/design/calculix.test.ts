import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir, runCalculix } from '../../../support/calculix';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { axialStiffness } from '../../../../shared/engine/design/deflection';
import { generateProfile } from '../../../../shared/engine/profiles';
import { engineInput, TYPICAL_LOADS } from './support/inputs';

/**
 * Cross-check of designed trusses against an independent general-purpose solver: CalculiX
 * (Debian package calculix-ccx), linear static, T3D2 truss elements, the same approach as
 * tests/shared/engine/analysis/calculix.test.ts. Section areas from the designed lumber, E = 1
 * scaled into them (forces of a determinate truss do not depend on EA).
 */

const E = 10000; // MPa; each section's area is EA / E so that CalculiX sees the designed EA.
const work = calculixWorkDir('spanwise-design-ccx-');

const snowLoads = { ...TYPICAL_LOADS, snow: { pg: 40 }, windUplift: 12 };
const cases = [
  {
    name: 'fink',
    draft: {
      units: 'imperial',
      profile: 'fink',
      span: 30 * 12,
      pitch: 5,
      heelHeight: 14,
      overhang: 18,
      loads: snowLoads,
    },
    combination: 'D + S',
  },
  {
    name: 'scissor',
    draft: {
      units: 'imperial',
      profile: 'scissor',
      span: 32 * 12,
      pitch: 6,
      bottomPitch: 3,
      overhang: 12,
      loads: snowLoads,
    },
    // ASCE 7-16 §2.4.1 6a without L: D + 0.75(0.6W) + 0.75S.
    combination: 'D + 0.45W + 0.75S',
  },
] as const;

describe('designed trusses against CalculiX (T3D2 linear static)', () => {
  if (calculixMissing()) return;
  for (const c of cases) {
    it(`${c.name}: member forces under ${c.combination} agree to 1e-4 of the largest`, () => {
      const input = engineInput(c.draft);
      const design = designTruss(input);
      const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
      const combos = designLoads(input, profile, '7-16').combinations;
      const i = combos.findIndex((x) => x.name === c.combination);
      expect(i).toBeGreaterThanOrEqual(0);
      const ea = design.members.map((m) => axialStiffness(m.lumber, input.plies));
      const model = {
        joints: profile.joints,
        members: profile.members.map((m, k) => ({ from: m.from, to: m.to, ea: ea[k] })),
        supports: profile.supports,
        loads: combos[i].jointLoads,
      };
      const u = runCalculix(work, c.name, model, E);
      expect(u.size).toBe(profile.joints.length);
      const index = new Map(profile.joints.map((j, n) => [j.id, n]));
      const largest = Math.max(...design.members.map((m) => Math.abs(m.forces[i])));
      profile.members.forEach((m, k) => {
        const a = profile.joints[index.get(m.from)!];
        const b = profile.joints[index.get(m.to)!];
        const len = Math.hypot(b.x - a.x, b.y - a.y);
        const [ua, va] = u.get(index.get(m.from)! + 1)!;
        const [ub, vb] = u.get(index.get(m.to)! + 1)!;
        // N = EA/L · Δu·e
        const n = (ea[k] / len) * (((ub - ua) * (b.x - a.x) + (vb - va) * (b.y - a.y)) / len);
        expect(n).toBeWithin(design.members[k].forces[i], { rel: 0, abs: 1e-4 * largest });
      });
    });
  }
});
