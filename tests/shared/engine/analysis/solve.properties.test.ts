import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  analyzeTruss,
  prepareTruss,
  solveLoads,
  validateModel,
  type AnalysisResult,
  type JointLoad,
  type TrussModel,
} from '../../../../shared/engine/analysis';
import { engineErrorOf } from './support/errors';
import { pitchedTruss, warren } from './support/layouts';

// Property tests over generated stable layouts (common practice: random heights, spans, loads).
const NUM_RUNS = 100;

const force = fc.double({ min: -2e4, max: 2e4, noNaN: true });

/** A Warren with random panel count, panel width and top-joint heights, or a pitched Howe/Pratt. */
const stableTruss: fc.Arbitrary<TrussModel> = fc.oneof(
  fc
    .integer({ min: 1, max: 7 })
    .chain((n) =>
      fc.tuple(
        fc.constant(n),
        fc.double({ min: 400, max: 3000, noNaN: true }),
        fc.array(fc.double({ min: 300, max: 3000, noNaN: true }), { minLength: n, maxLength: n }),
      ),
    )
    .map(([n, a, heights]) => warren(n, a, heights, 4e7)),
  fc
    .tuple(
      fc.constantFrom(2, 4, 6, 8, 10),
      fc.double({ min: 3000, max: 15000, noNaN: true }),
      fc.double({ min: 0.1, max: 1, noNaN: true }),
      fc.constantFrom('howe' as const, 'pratt' as const),
    )
    .map(([n, span, slope, style]) => pitchedTruss(n, span, (span / 2) * slope, style, 4e7)),
);

/** Random loads on the truss's own joints. */
const loadsFor = (model: TrussModel) =>
  fc.array(
    fc.record({ joint: fc.constantFrom(...model.joints.map((j) => j.id)), fx: force, fy: force }),
    { minLength: 1, maxLength: 8 },
  );

const withLoads = stableTruss.chain((model) =>
  fc.tuple(fc.constant(model), loadsFor(model), loadsFor(model)),
);

const forces = (r: AnalysisResult) => r.members.map((m) => m.force);

/** Element-wise equality up to 1e-9 of the larger vector's largest entry. */
function expectClose(actual: number[], expected: number[]) {
  const scale = Math.max(1, ...actual.map(Math.abs), ...expected.map(Math.abs));
  expect(actual).toHaveLength(expected.length);
  actual.forEach((v, i) => expect(v).toBeWithin(expected[i], { rel: 0, abs: 1e-9 * scale }));
}

const scaled = (loads: JointLoad[], k: number) =>
  loads.map((l) => ({ joint: l.joint, fx: (l.fx ?? 0) * k, fy: (l.fy ?? 0) * k }));

describe('analysis properties', () => {
  it('equilibrium residual is tiny', () => {
    fc.assert(
      fc.property(withLoads, ([model, loads]) => {
        expect(analyzeTruss({ ...model, loads }).residual).toBeLessThan(1e-9);
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it('results are linear in the loads: scaling and superposition', () => {
    fc.assert(
      fc.property(withLoads, fc.double({ min: -10, max: 10, noNaN: true }), ([m, p1, p2], k) => {
        const prepared = prepareTruss(m);
        const r1 = solveLoads(prepared, p1);
        const r2 = solveLoads(prepared, p2);
        expectClose(
          forces(solveLoads(prepared, scaled(p1, k))),
          forces(r1).map((f) => f * k),
        );
        const sum = solveLoads(prepared, [...p1, ...p2]);
        expectClose(
          forces(sum),
          forces(r1).map((f, i) => f + forces(r2)[i]),
        );
        const uy = (r: AnalysisResult) => r.displacements!.map((d) => d.uy);
        expectClose(
          uy(sum),
          uy(r1).map((u, i) => u + uy(r2)[i]),
        );
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it('mirrored geometry and loads give the same member forces', () => {
    fc.assert(
      fc.property(withLoads, ([model, loads]) => {
        const mirrored: TrussModel = {
          ...model,
          joints: model.joints.map((j) => ({ ...j, x: -j.x })),
          loads: loads.map((l) => ({ ...l, fx: -(l.fx ?? 0) })),
        };
        const r = analyzeTruss({ ...model, loads });
        const rm = analyzeTruss(mirrored);
        expectClose(forces(rm), forces(r));
        expectClose(
          rm.reactions.flatMap((x) => [-x.rx, x.ry]),
          r.reactions.flatMap((x) => [x.rx, x.ry]),
        );
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it("reversing a member's from/to changes nothing", () => {
    fc.assert(
      fc.property(withLoads, fc.nat(), ([model, loads], pick) => {
        const k = pick % model.members.length;
        const members = model.members.map((m, i) =>
          i === k ? { ...m, id: m.from + m.to, from: m.to, to: m.from } : m,
        );
        const r = analyzeTruss({ ...model, loads });
        const rr = analyzeTruss({ ...model, members, loads });
        expect(rr.members.map((m) => m.id)).toEqual(r.members.map((m) => m.id));
        expectClose(forces(rr), forces(r));
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it('removing any member of a determinate truss makes it unstable', () => {
    fc.assert(
      fc.property(stableTruss, fc.nat(), (model, pick) => {
        const members = model.members.filter((_, i) => i !== pick % model.members.length);
        const e = engineErrorOf(() => prepareTruss({ ...model, members }));
        expect(e.code).toBe('unstable');
        expect((e.details!.joints as string[]).length).toBeGreaterThan(0);
      }),
      { numRuns: NUM_RUNS },
    );
  });

  it('extra members with ea make it indeterminate and still in equilibrium', () => {
    fc.assert(
      fc.property(
        withLoads,
        fc.array(fc.nat(), { minLength: 2, maxLength: 6 }),
        ([m, loads], picks) => {
          const ids = m.joints.map((j) => j.id);
          const existing = new Set(m.members.flatMap((x) => [x.from + x.to, x.to + x.from]));
          const extra = [];
          for (let i = 0; i + 1 < picks.length; i += 2) {
            const from = ids[picks[i] % ids.length];
            const to = ids[picks[i + 1] % ids.length];
            if (from === to || existing.has(from + to)) continue;
            existing.add(from + to).add(to + from);
            extra.push({ from, to, ea: 3e7 });
          }
          fc.pre(extra.length > 0);
          const r = analyzeTruss({ ...m, members: [...m.members, ...extra], loads });
          expect(r.classification).toBe('indeterminate');
          expect(r.redundants).toBe(extra.length);
          expect(r.residual).toBeLessThan(1e-9);
        },
      ),
      { numRuns: NUM_RUNS },
    );
  });

  it('a non-finite number anywhere is rejected as invalid', () => {
    const bad = fc.constantFrom(NaN, Infinity, -Infinity);
    fc.assert(
      fc.property(
        withLoads,
        bad,
        fc.nat(),
        fc.constantFrom(0, 1, 2, 3),
        ([m, loads], v, pick, where) => {
          const model: TrussModel = structuredClone({ ...m, loads });
          if (where === 0) model.joints[pick % model.joints.length].x = v;
          if (where === 1) model.joints[pick % model.joints.length].y = v;
          if (where === 2) model.members[pick % model.members.length].ea = v;
          if (where === 3) model.loads![pick % model.loads!.length].fy = v;
          expect(engineErrorOf(() => validateModel(model)).code).toBe('invalid');
          expect(engineErrorOf(() => analyzeTruss(model)).code).toBe('invalid');
        },
      ),
      { numRuns: NUM_RUNS },
    );
  });
});
