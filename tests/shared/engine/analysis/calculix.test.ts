import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { delimiter, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { analyzeTruss, type TrussModel } from '../../../../shared/engine/analysis';
import { pitchedTruss, warren } from './support/layouts';

/**
 * Cross-check against an independent general-purpose solver: CalculiX (Debian package
 * calculix-ccx), linear static analysis with T3D2 truss elements. Demo sections and loads.
 */

const E = 11000; // MPa, demo value

const ccx = [
  '/usr/bin/ccx',
  ...(process.env.PATH ?? '').split(delimiter).map((d) => join(d, 'ccx')),
].find((p) => p && existsSync(p));

/** CalculiX input: one element set and section per member so each can have its own area. */
function calculixInput(model: TrussModel): string {
  const node = new Map(model.joints.map((j, i) => [j.id, i + 1]));
  const lines = ['*NODE, NSET=Nall'];
  model.joints.forEach((j, i) => lines.push(`${i + 1}, ${j.x}, ${j.y}, 0`));
  model.members.forEach((m, k) => {
    lines.push(
      `*ELEMENT, TYPE=T3D2, ELSET=E${k + 1}`,
      `${k + 1}, ${node.get(m.from)}, ${node.get(m.to)}`,
    );
  });
  lines.push('*MATERIAL, NAME=WOOD', '*ELASTIC', `${E}, 0.3`);
  model.members.forEach((m, k) => {
    lines.push(`*SOLID SECTION, ELSET=E${k + 1}, MATERIAL=WOOD`, `${m.ea! / E}`);
  });
  lines.push('*BOUNDARY', 'Nall, 3, 3');
  for (const s of model.supports) {
    const n = node.get(s.joint);
    if (s.type === 'pin') lines.push(`${n}, 1, 2`);
    else lines.push(s.normal === 'x' ? `${n}, 1, 1` : `${n}, 2, 2`);
  }
  lines.push('*STEP', '*STATIC', '*CLOAD');
  for (const l of model.loads ?? []) {
    if (l.fx) lines.push(`${node.get(l.joint)}, 1, ${l.fx}`);
    if (l.fy) lines.push(`${node.get(l.joint)}, 2, ${l.fy}`);
  }
  lines.push('*NODE PRINT, NSET=Nall', 'U', '*END STEP', '');
  return lines.join('\n');
}

/** Node displacements (ux, uy) from the .dat table that *NODE PRINT writes. */
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

const work = ccx ? mkdtempSync(join(tmpdir(), 'spanwise-ccx-')) : '';
afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

function runCalculix(name: string, model: TrussModel) {
  writeFileSync(join(work, `${name}.inp`), calculixInput(model));
  execFileSync(ccx!, ['-i', name], { cwd: work, timeout: 30000, stdio: 'pipe' });
  return parseDisplacements(readFileSync(join(work, `${name}.dat`), 'utf8'));
}

const topLoads = (model: TrussModel, p: number) =>
  model.joints
    .filter((j) => j.id.startsWith('U'))
    .map((j, i) => ({ joint: j.id, fy: -p * (1 + 0.1 * i), fx: i === 0 ? 0.2 * p : 0 }));

/** A pitched Pratt with the Howe diagonals added too (both diagonals in the inner panels). */
function crossBraced(): TrussModel {
  const pratt = pitchedTruss(6, 9000, 2500, 'pratt');
  const howe = pitchedTruss(6, 9000, 2500, 'howe');
  const ids = new Set(pratt.members.map((m) => m.from + m.to));
  const members = [...pratt.members, ...howe.members.filter((m) => !ids.has(m.from + m.to))];
  // Varied areas so that the redundant forces depend on relative stiffness.
  return { ...pratt, members: members.map((m, k) => ({ ...m, ea: E * (2000 + 500 * (k % 4)) })) };
}

const cases: [string, TrussModel][] = [
  ['warren', warren(6, 1500, [1000, 1200, 1400, 1400, 1200, 1000], E * 3382)],
  ['howe', pitchedTruss(8, 9600, 2400, 'howe', E * 3382)],
  ['indeterminate', crossBraced()],
];

describe('CalculiX cross-check (T3D2 linear static)', () => {
  if (!ccx) {
    const why = 'ccx not found: install the Debian package calculix-ccx';
    if (process.env.CI) it('CalculiX is installed', () => expect.fail(why));
    else it.skip(`skipped, ${why}`, () => {});
    return;
  }
  for (const [name, base] of cases) {
    it(`${name}: displacements and member forces agree`, () => {
      const model = { ...base, loads: topLoads(base, 2500) };
      const ours = analyzeTruss(model);
      if (name === 'indeterminate') expect(ours.classification).toBe('indeterminate');
      const theirs = runCalculix(name, model);
      expect(theirs.size).toBe(model.joints.length);
      const largestU = Math.max(
        ...ours.displacements!.flatMap((d) => [Math.abs(d.ux), Math.abs(d.uy)]),
      );
      ours.displacements!.forEach((d, i) => {
        const [ux, uy] = theirs.get(i + 1)!;
        // CalculiX prints 7 significant figures.
        expect(ux).toBeWithin(d.ux, { rel: 0, abs: 1e-5 * largestU });
        expect(uy).toBeWithin(d.uy, { rel: 0, abs: 1e-5 * largestU });
      });
      const index = new Map(model.joints.map((j, i) => [j.id, i + 1]));
      const largestN = Math.max(...ours.members.map((m) => Math.abs(m.force)));
      model.members.forEach((m, k) => {
        const a = model.joints[index.get(m.from)! - 1];
        const b = model.joints[index.get(m.to)! - 1];
        const len = Math.hypot(b.x - a.x, b.y - a.y);
        const [ua, va] = theirs.get(index.get(m.from)!)!;
        const [ub, vb] = theirs.get(index.get(m.to)!)!;
        // N = EA/L · Δu·e
        const n =
          (m.ea! / len) * (((ub - ua) * (b.x - a.x)) / len + ((vb - va) * (b.y - a.y)) / len);
        expect(n).toBeWithin(ours.members[k].force, { rel: 0, abs: 1e-4 * largestN });
      });
    });
  }
});
