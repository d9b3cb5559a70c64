import { describe, expect, it } from 'vitest';
import { calculixMissing, calculixWorkDir, runCalculix as run } from '../../../support/calculix';
import { analyzeTruss, type TrussModel } from '../../../../shared/engine/analysis';
import { pitchedTruss, warren } from './support/layouts';

/**
 * Cross-check against an independent general-purpose solver: CalculiX (Debian package
 * calculix-ccx), linear static analysis with T3D2 truss elements. Demo sections and loads.
 */

const E = 11000; // MPa, demo value

const work = calculixWorkDir('spanwise-ccx-');
const runCalculix = (name: string, model: TrussModel) => run(work, name, model, E);

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
  if (calculixMissing()) return;
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
