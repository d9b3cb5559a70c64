import { describe, expect, it } from 'vitest';
import {
  analyzeTruss,
  prepareTruss,
  solveLoads,
  type TrussModel,
} from '../../../../shared/engine/analysis';
import { kingPost, parallelPratt } from './support/layouts';
import { engineErrorOf } from './support/errors';

const square = (diagonals: string[], ea?: number): TrussModel => ({
  joints: [
    { id: 'A', x: 0, y: 0 },
    { id: 'B', x: 1000, y: 0 },
    { id: 'C', x: 1000, y: 1000 },
    { id: 'D', x: 0, y: 1000 },
  ],
  members: ['AB', 'BC', 'CD', 'DA', ...diagonals].map((id) => ({ from: id[0], to: id[1], ea })),
  supports: [
    { joint: 'A', type: 'pin' },
    { joint: 'B', type: 'roller' },
  ],
});

describe('prepareTruss classification and refusals', () => {
  it('a square without a diagonal is a mechanism: C and D sway, A and B stay', () => {
    const e = engineErrorOf(() => prepareTruss(square([])));
    expect(e.code).toBe('unstable');
    expect(e.details!.joints).toEqual(['C', 'D']);
    expect(e.details!.shortBy).toBe(1);
    expect(e.message).toContain('joints C, D can move');
    expect(e.message).toContain('at least 1 more member or support component');
  });

  it('a rank-deficient square count (m + r = 2j) is unstable too', () => {
    // King post on three vertical rollers: m + r = 2j, but nothing stops it sliding along x.
    const model = kingPost(6000, 2000);
    model.supports = [
      { joint: 'L0', type: 'roller' },
      { joint: 'L2', type: 'roller' },
      { joint: 'L1', type: 'roller' },
    ];
    const e = engineErrorOf(() => prepareTruss(model));
    expect(e.code).toBe('unstable');
    expect(e.details!.joints).toEqual(['L0', 'L1', 'L2', 'U1']);
    expect(e.details!.shortBy).toBe(0);
  });

  it('collinear members at an unbraced joint form a mechanism (exact geometry)', () => {
    // Two collinear bars A–B–C pinned at A and C: B can move sideways without stretching them
    // to first order, so the equilibrium matrix is rank-deficient.
    const model: TrussModel = {
      joints: [
        { id: 'A', x: 0, y: 0 },
        { id: 'B', x: 500, y: 0 },
        { id: 'C', x: 1000, y: 0 },
      ],
      members: [
        { from: 'A', to: 'B' },
        { from: 'B', to: 'C' },
      ],
      supports: [
        { joint: 'A', type: 'pin' },
        { joint: 'C', type: 'pin' },
      ],
    };
    const e = engineErrorOf(() => prepareTruss(model));
    expect(e.code).toBe('unstable');
    expect(e.details!.joints).toEqual(['B']);
  });

  it('an indeterminate truss without ea names the members that lack it', () => {
    const model = square(['AC', 'BD']);
    model.members[0].ea = 1e7;
    const e = engineErrorOf(() => prepareTruss(model));
    expect(e.code).toBe('indeterminate');
    expect(e.details!.members).toEqual(['BC', 'CD', 'DA', 'AC', 'BD']);
    expect(e.message).toMatch(/statically indeterminate \(1 redundant\)/);
  });

  it('an indeterminate mechanism is reported as unstable, not as missing ea', () => {
    // Both diagonals but nothing holds joint E, which hangs free of every member.
    const model = square(['AC', 'BD']);
    model.joints.push({ id: 'E', x: 2000, y: 0 });
    const e = engineErrorOf(() => prepareTruss(model));
    expect(e.code).toBe('unstable');
    expect(e.details!.joints).toEqual(['E']);
  });

  it('an indeterminate mechanism with ea is caught by the stiffness factorisation', () => {
    // Both diagonals, but a lone pendulum bar B–E lets E swing about B.
    const model = square(['AC', 'BD'], 1e7);
    model.joints.push({ id: 'E', x: 2000, y: 0 });
    model.members.push({ from: 'B', to: 'E', ea: 1e7 });
    const e = engineErrorOf(() => prepareTruss(model));
    expect(e.code).toBe('unstable');
    expect(e.details!.joints).toEqual(['E']);
  });

  it('an indeterminate truss with ea is classified and solved', () => {
    const r = analyzeTruss({ ...square(['AC', 'BD'], 1e7), loads: [{ joint: 'C', fy: -1000 }] });
    expect(r.classification).toBe('indeterminate');
    expect(r.redundants).toBe(1);
    expect(r.residual).toBeLessThan(1e-12);
  });

  it('a determinate truss is classified as such, with displacements only given ea', () => {
    const without = analyzeTruss({
      ...parallelPratt(4, 1000, 800),
      loads: [{ joint: 'L2', fy: -1 }],
    });
    expect(without.classification).toBe('determinate');
    expect(without.redundants).toBe(0);
    expect(without.displacements).toBeUndefined();
    const withEa = analyzeTruss({
      ...parallelPratt(4, 1000, 800, 1e7),
      loads: [{ joint: 'L2', fy: -1 }],
    });
    expect(withEa.displacements).toHaveLength(8);
  });

  it('solveLoads rejects loads on unknown joints and non-finite components', () => {
    const prepared = prepareTruss(kingPost(6000, 2000));
    const unknown = engineErrorOf(() => solveLoads(prepared, [{ joint: 'Q', fy: -1 }]));
    expect(unknown.code).toBe('invalid');
    expect(unknown.message).toContain('unknown joint "Q"');
    expect(engineErrorOf(() => solveLoads(prepared, [{ joint: 'U1', fx: NaN }])).code).toBe(
      'invalid',
    );
  });

  it('a wrong solution is never returned: a corrupted factorisation fails the residual check', () => {
    const prepared = prepareTruss(kingPost(6000, 2000));
    prepared.lu!.lu[0] *= 1.5;
    const e = engineErrorOf(() => solveLoads(prepared, [{ joint: 'U1', fy: -1000 }]));
    expect(e.code).toBe('unstable');
    expect(e.details!.residual as number).toBeGreaterThan(1e-6);
    expect(e.message).toMatch(/equilibrium check failed/);
  });
});
