import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { delimiter, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { JointLoad } from '../../../../shared/engine/analysis/types';
import { designTruss } from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { axialStiffness } from '../../../../shared/engine/design/deflection';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';
import { engineInput, TYPICAL_LOADS } from './support/inputs';

/**
 * Cross-check of designed trusses against an independent general-purpose solver: CalculiX
 * (Debian package calculix-ccx), linear static, T3D2 truss elements, the same approach as
 * tests/shared/engine/analysis/calculix.test.ts. Section areas from the designed lumber, E = 1
 * scaled into them (forces of a determinate truss do not depend on EA).
 */

const ccx = [
  '/usr/bin/ccx',
  ...(process.env.PATH ?? '').split(delimiter).map((d) => join(d, 'ccx')),
].find((p) => p && existsSync(p));

const E = 10000; // MPa; each section's area is EA / E so that CalculiX sees the designed EA.

function calculixInput(profile: TrussProfile, ea: number[], loads: JointLoad[]): string {
  const node = new Map(profile.joints.map((j, i) => [j.id, i + 1]));
  const lines = ['*NODE, NSET=Nall'];
  profile.joints.forEach((j, i) => lines.push(`${i + 1}, ${j.x}, ${j.y}, 0`));
  profile.members.forEach((m, k) => {
    lines.push(
      `*ELEMENT, TYPE=T3D2, ELSET=E${k + 1}`,
      `${k + 1}, ${node.get(m.from)}, ${node.get(m.to)}`,
    );
  });
  lines.push('*MATERIAL, NAME=WOOD', '*ELASTIC', `${E}, 0.3`);
  profile.members.forEach((_, k) => {
    lines.push(`*SOLID SECTION, ELSET=E${k + 1}, MATERIAL=WOOD`, `${ea[k] / E}`);
  });
  lines.push('*BOUNDARY', 'Nall, 3, 3');
  for (const s of profile.supports) {
    const n = node.get(s.joint);
    lines.push(s.type === 'pin' ? `${n}, 1, 2` : `${n}, 2, 2`);
  }
  lines.push('*STEP', '*STATIC', '*CLOAD');
  for (const l of loads) {
    if (l.fx) lines.push(`${node.get(l.joint)}, 1, ${l.fx}`);
    if (l.fy) lines.push(`${node.get(l.joint)}, 2, ${l.fy}`);
  }
  lines.push('*NODE PRINT, NSET=Nall', 'U', '*END STEP', '');
  return lines.join('\n');
}

function parseDisplacements(dat: string): Map<number, [number, number]> {
  const out = new Map<number, [number, number]>();
  const start = dat.indexOf('displacements (vx,vy,vz)');
  if (start < 0) throw new Error('no displacement table in the CalculiX output');
  for (const line of dat.slice(start).split('\n').slice(1)) {
    const cols = line.trim().split(/\s+/);
    if (cols.length !== 4) {
      if (out.size > 0) break;
      continue;
    }
    out.set(Number(cols[0]), [Number(cols[1]), Number(cols[2])]);
  }
  return out;
}

const work = ccx ? mkdtempSync(join(tmpdir(), 'spanwise-design-ccx-')) : '';
afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

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
  if (!ccx) {
    const why = 'ccx not found: install the Debian package calculix-ccx';
    if (process.env.CI) it('CalculiX is installed', () => expect.fail(why));
    else it.skip(`skipped, ${why}`, () => {});
    return;
  }
  for (const c of cases) {
    it(`${c.name}: member forces under ${c.combination} agree to 1e-4 of the largest`, () => {
      const input = engineInput(c.draft);
      const design = designTruss(input);
      const profile = generateProfile({ ...input.profile, heelHeight: design.heelHeight.analysed });
      const combos = designLoads(input, profile, '7-16').combinations;
      const i = combos.findIndex((x) => x.name === c.combination);
      expect(i).toBeGreaterThanOrEqual(0);
      const ea = design.members.map((m) => axialStiffness(m.lumber, input.plies));
      writeFileSync(join(work, `${c.name}.inp`), calculixInput(profile, ea, combos[i].jointLoads));
      execFileSync(ccx!, ['-i', c.name], { cwd: work, timeout: 30000, stdio: 'pipe' });
      const u = parseDisplacements(readFileSync(join(work, `${c.name}.dat`), 'utf8'));
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
