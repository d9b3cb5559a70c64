import { describe, expect, it } from 'vitest';
import {
  analyzeTruss,
  prepareTruss,
  solveLoads,
  unitLoadDeflection,
} from '../../../../shared/engine/analysis';
import { engineErrorOf } from './support/errors';
import { kingPost, pitchedTruss, warren } from './support/layouts';

// EA of a 38 × 89 mm member with E = 11 000 MPa: demo value.
const EA = 11000 * 38 * 89;

describe('unitLoadDeflection (δ = Σ N·n·L/EA) against the stiffness displacements', () => {
  const layouts = {
    'pitched Howe': pitchedTruss(8, 9600, 2400, 'howe', EA),
    'pitched Pratt': pitchedTruss(10, 12000, 3000, 'pratt', EA),
    Warren: warren(5, 1500, [900, 1100, 1300, 1100, 900], EA),
  };
  for (const [name, model] of Object.entries(layouts)) {
    it(`${name}: every joint, both directions, several load cases, to 1e-9 relative`, () => {
      const prepared = prepareTruss(model);
      const cases = [
        model.joints.filter((j) => j.id.startsWith('U')).map((j) => ({ joint: j.id, fy: -800 })),
        [{ joint: 'L2', fy: -3000, fx: 700 }],
        model.joints.map((j, i) => ({ joint: j.id, fx: 100 * (i % 3), fy: -50 * i })),
      ];
      for (const loads of cases) {
        const r = solveLoads(prepared, loads);
        const largest = Math.max(
          ...r.displacements!.flatMap((d) => [Math.abs(d.ux), Math.abs(d.uy)]),
        );
        for (const d of r.displacements!) {
          const dy = unitLoadDeflection(prepared, r.members, d.joint, 'y');
          const dx = unitLoadDeflection(prepared, r.members, d.joint, 'x');
          expect(dy).toBeWithin(d.uy, { rel: 1e-9, abs: 1e-9 * largest });
          expect(dx).toBeWithin(d.ux, { rel: 1e-9, abs: 1e-9 * largest });
        }
      }
    });
  }

  it('king post: peak deflection matches the closed form Σ N·n·L/EA', () => {
    // With P at the peak: rafters −P/(2 sin θ), ties P/(2 tan θ), king post 0; the unit case is
    // the same with P = 1, so δ = [2·(1/(2 sin θ))²·Lr + 2·(1/(2 tan θ))²·(s/2)]·P/EA.
    const span = 8000;
    const rise = 3000;
    const p = 5000;
    const model = kingPost(span, rise, EA);
    const prepared = prepareTruss(model);
    const r = solveLoads(prepared, [{ joint: 'U1', fy: -p }]);
    const theta = Math.atan(rise / (span / 2));
    const rafter = Math.hypot(span / 2, rise);
    const closed =
      ((2 * rafter) / (2 * Math.sin(theta)) ** 2 + span / (2 * Math.tan(theta)) ** 2) * (p / EA);
    expect(unitLoadDeflection(prepared, r.members, 'U1', 'y')).toBeWithin(-closed, { rel: 1e-12 });
    expect(r.displacements!.find((d) => d.joint === 'U1')!.uy).toBeWithin(-closed, { rel: 1e-12 });
  });

  it('refuses an indeterminate truss, missing ea, unknown joints and missing forces', () => {
    const sq = {
      joints: [
        { id: 'A', x: 0, y: 0 },
        { id: 'B', x: 1, y: 0 },
        { id: 'C', x: 1, y: 1 },
        { id: 'D', x: 0, y: 1 },
      ],
      members: ['AB', 'BC', 'CD', 'DA', 'AC', 'BD'].map((id) => ({
        from: id[0],
        to: id[1],
        ea: 1,
      })),
      supports: [
        { joint: 'A', type: 'pin' as const },
        { joint: 'B', type: 'roller' as const },
      ],
    };
    const ind = prepareTruss(sq);
    const ir = solveLoads(ind, [{ joint: 'C', fx: 1 }]);
    expect(engineErrorOf(() => unitLoadDeflection(ind, ir.members, 'C', 'x')).code).toBe(
      'indeterminate',
    );
    const noEa = prepareTruss(kingPost(6000, 2000));
    const nr = analyzeTruss({ ...kingPost(6000, 2000), loads: [{ joint: 'U1', fy: -1 }] });
    expect(engineErrorOf(() => unitLoadDeflection(noEa, nr.members, 'U1', 'y')).code).toBe(
      'invalid',
    );
    const ok = prepareTruss(kingPost(6000, 2000, EA));
    expect(engineErrorOf(() => unitLoadDeflection(ok, nr.members, 'Q', 'y')).code).toBe('invalid');
    expect(engineErrorOf(() => unitLoadDeflection(ok, nr.members.slice(1), 'U1', 'y')).code).toBe(
      'invalid',
    );
  });
});
