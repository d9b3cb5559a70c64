/**
 * The independent solver the engine is checked against: CalculiX (Debian package calculix-ccx),
 * linear static, T3D2 truss elements, `*NODE PRINT` of U. Shared by the analysis and design tests.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { delimiter, join } from 'node:path';
import { afterAll, expect, it } from 'vitest';
import type { TrussModel } from '../../shared/engine/analysis/types';

/** The `ccx` binary, or undefined when it is not installed. */
export const ccx = [
  '/usr/bin/ccx',
  ...(process.env.PATH ?? '').split(delimiter).map((d) => join(d, 'ccx')),
].find((p) => p && existsSync(p));

/**
 * Without ccx: a failing test, everywhere (a check against the independent solver never passes by
 * being skipped; `npm test` installs it). Returns true when the caller should stop declaring its
 * CalculiX tests.
 */
export function calculixMissing(): boolean {
  if (ccx) return false;
  it('CalculiX is installed', () =>
    expect.fail('ccx not found: apt-get install -y calculix-ccx (npm test installs it as root)'));
  return true;
}

/** CalculiX input: one element set and section per member so each can have its own EA. */
export function calculixInput(model: TrussModel, e: number): string {
  const node = new Map(model.joints.map((j, i) => [j.id, i + 1]));
  const lines = ['*NODE, NSET=Nall'];
  model.joints.forEach((j, i) => lines.push(`${i + 1}, ${j.x}, ${j.y}, 0`));
  model.members.forEach((m, k) => {
    lines.push(
      `*ELEMENT, TYPE=T3D2, ELSET=E${k + 1}`,
      `${k + 1}, ${node.get(m.from)}, ${node.get(m.to)}`,
    );
  });
  lines.push('*MATERIAL, NAME=WOOD', '*ELASTIC', `${e}, 0.3`);
  model.members.forEach((m, k) => {
    lines.push(`*SOLID SECTION, ELSET=E${k + 1}, MATERIAL=WOOD`, `${m.ea! / e}`);
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

/** Node displacements (ux, uy) by CalculiX node number from the .dat table *NODE PRINT writes. */
export function parseDisplacements(dat: string): Map<number, [number, number]> {
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

/** A scratch folder for this test file's runs, removed afterwards. */
export function calculixWorkDir(prefix: string) {
  const work = ccx ? mkdtempSync(join(tmpdir(), prefix)) : '';
  afterAll(() => {
    if (work) rmSync(work, { recursive: true, force: true });
  });
  return work;
}

/** Run CalculiX on a model (every member with `ea`); displacements by node number (1-based). */
export function runCalculix(work: string, name: string, model: TrussModel, e: number) {
  writeFileSync(join(work, `${name}.inp`), calculixInput(model, e));
  execFileSync(ccx!, ['-i', name], { cwd: work, timeout: 30000, stdio: 'pipe' });
  return parseDisplacements(readFileSync(join(work, `${name}.dat`), 'utf8'));
}
