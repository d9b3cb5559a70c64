import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { planCutting, type CuttingInput, type LpSolver } from '../../../../shared/engine/cutting';
import { boundedKnapsack } from '../../../../shared/engine/cutting/knapsack';
import { commonUnit, gridKnapsacks } from '../../../../shared/engine/cutting/knapsackGrid';
import { isEngineError } from '../../../../shared/engine/errors';
import { loadLpSolver } from '../../../../server/services/lp';
import { planProblems } from './feasibility';

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

/** Random orders: 1–4 stock lengths (some with counts on hand), kerf, trim, 1–8 piece lengths. */
const orders = fc.record({
  stocks: fc.array(
    fc.record({
      length: fc.integer({ min: 60, max: 240 }),
      cost: fc.integer({ min: 1, max: 50 }),
      available: fc.option(fc.integer({ min: 0, max: 30 }), { nil: undefined }),
    }),
    { minLength: 1, maxLength: 4 },
  ),
  kerf: fc.constantFrom(0, 0.125, 1),
  trim: fc.constantFrom(0, 0.5, 2),
  pieces: fc.array(
    fc.record({
      length: fc.integer({ min: 5, max: 120 }),
      quantity: fc.integer({ min: 1, max: 25 }),
    }),
    { minLength: 1, maxLength: 8 },
  ),
}) as fc.Arbitrary<CuttingInput>;

describe('every plan is feasible and within its bound (property)', () => {
  it('holds over random orders', () => {
    fc.assert(
      fc.property(orders, (input) => {
        let plan;
        try {
          plan = planCutting(input, { lp, timeLimitMs: 200 });
        } catch (e) {
          // Refusals are fine only with their stable codes.
          return isEngineError(e) && ['piece_too_long', 'not_enough_stock'].includes(e.code);
        }
        expect(planProblems(input, plan)).toEqual([]);
        expect(plan.totalCost).toBeGreaterThanOrEqual(plan.lowerBound.cost - 1e-6);
        expect(plan.lowerBound.lp ?? 0).toBeLessThanOrEqual(plan.lowerBound.cost + 1e-6);
        if (plan.firstFitDecreasing) {
          expect(plan.totalCost).toBeLessThanOrEqual(plan.firstFitDecreasing.totalCost + 1e-9);
        }
        return true;
      }),
      { numRuns: 40, seed: 20261202 },
    );
  }, 180_000);
});

describe('bounded knapsack (pricing)', () => {
  it('finds the grid of 1/16 in lengths in mm (hand-checked: 25.4 / 16 = 1.5875)', () => {
    expect(commonUnit([1.5875 * 97, 1.5875 * 3840, 3.175], 1e-6)).toBeCloseTo(1.5875, 9);
    expect(commonUnit([1, Math.SQRT2], 1e-6)).toBe(0);
  });

  it('matches exhaustive search on small random instances', () => {
    const instance = fc.record({
      items: fc.array(
        fc.record({
          v: fc.integer({ min: 0, max: 30 }),
          w: fc.integer({ min: 1, max: 40 }),
          u: fc.integer({ min: 0, max: 4 }),
        }),
        { minLength: 1, maxLength: 5 },
      ),
      cap: fc.integer({ min: 1, max: 100 }),
    });
    fc.assert(
      fc.property(instance, ({ items, cap }) => {
        const r = boundedKnapsack(
          items.map((i) => i.v),
          items.map((i) => i.w),
          items.map((i) => i.u),
          cap,
          1e-9,
        );
        let best = 0;
        const walk = (k: number, room: number, value: number) => {
          if (k === items.length) {
            best = Math.max(best, value);
            return;
          }
          for (let a = 0; a <= items[k]!.u && a * items[k]!.w <= room; a++)
            walk(k + 1, room - a * items[k]!.w, value + a * items[k]!.v);
        };
        walk(0, cap, 0);
        expect(r.value).toBe(best);
        // The table answers every capacity at once; the search and the table agree.
        const [table] = gridKnapsacks(
          items.map((i) => i.v),
          items.map((i) => i.w),
          items.map((i) => i.u),
          [cap],
        );
        expect(table!.value).toBe(best);
        expect(
          table!.items.reduce((s, i, k) => s + items[i]!.w * table!.counts[k]!, 0),
        ).toBeLessThanOrEqual(cap);
        table!.items.forEach((i, k) => expect(table!.counts[k]!).toBeLessThanOrEqual(items[i]!.u));
        expect(r.items.reduce((s, i, k) => s + items[i]!.w * r.counts[k]!, 0)).toBeLessThanOrEqual(
          cap,
        );
        return true;
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
