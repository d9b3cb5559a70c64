import { beforeAll, describe, expect, it, vi } from 'vitest';
import {
  planCutting,
  planCuttingSteps,
  type CuttingProgress,
  type LpSolver,
} from '../../../../shared/engine/cutting';
import { loadLpSolver } from '../../../../server/services/lp';

vi.setConfig({ testTimeout: 60_000 });

let lp: LpSolver;
beforeAll(async () => {
  lp = await loadLpSolver();
});

// GAMS model library, cutstock (after Chvátal, Linear Programming, 1983): width 100,
// demands 97×45, 610×36, 395×31, 211×14; optimum 453.
const input = {
  stocks: [{ length: 100, cost: 1 }],
  pieces: [
    { length: 45, quantity: 97 },
    { length: 36, quantity: 610 },
    { length: 31, quantity: 395 },
    { length: 14, quantity: 211 },
  ],
};

describe('progress of a plan', () => {
  it('reports each column-generation round, then the integer phase, then done; same plan', () => {
    const seen: CuttingProgress[] = [];
    const plan = planCutting(input, { lp, timeLimitMs: 10_000, onProgress: (p) => seen.push(p) });
    const cg = seen.filter((p) => p.stage === 'column-generation');
    const rounds = cg.map((p) => p.iterations);
    expect(rounds.length).toBeGreaterThan(0);
    expect(rounds).toEqual(rounds.map((_, i) => i + 1));
    // The lower bound only rises while the LP is solved; the best plan (first-fit decreasing's
    // until the integer phase) stays above it, so the gap is never negative.
    const bounds = cg.map((p) => p.lowerBound);
    expect(bounds).toEqual([...bounds].sort((a, b) => a - b));
    for (const p of seen) expect(p.gapPercent ?? 0).toBeGreaterThanOrEqual(0);
    // The integer phase: steps counted up, pieces left counted down to none.
    const whole = seen.filter((p) => p.stage === 'integer-phase');
    expect(whole[0]).toMatchObject({ steps: 0, piecesLeft: 1313, pieces: 1313 });
    const left = whole.map((p) => p.piecesLeft!);
    expect(left).toEqual([...left].sort((a, b) => b - a));
    expect(whole.at(-1)!.steps).toBeGreaterThan(0);
    // Done: the plan's cost over its bound, 453 boards on the LP bound 452.25 rounded up.
    expect(seen.at(-1)).toMatchObject({ stage: 'done', iterations: rounds.length, bestCost: 453 });
    expect(seen.at(-1)!.lowerBound).toBe(453);
    expect(seen.at(-1)!.gapPercent).toBe(0);
    expect(plan.boardCount).toBe(453);
    expect(planCutting(input, { lp, timeLimitMs: 10_000 }).boardCount).toBe(453);
  });

  it('step by step: the same plan as the one-call solve, with progress between steps', () => {
    const steps = planCuttingSteps(input, { lp, timeLimitMs: 10_000 });
    let n = 0;
    let next = steps.next();
    while (!next.done) {
      n += 1;
      next = steps.next();
    }
    expect(n).toBeGreaterThan(2);
    expect(next.value.boardCount).toBe(453);
  });

  it('without an LP solver: only done, with first-fit decreasing over the material bound', () => {
    const seen: CuttingProgress[] = [];
    const plan = planCutting(input, { onProgress: (p) => seen.push(p) });
    expect(seen).toHaveLength(1);
    expect(seen[0]).toMatchObject({ stage: 'done', iterations: 0, bestCost: plan.totalCost });
    expect(seen[0]!.lowerBound).toBeCloseTo(plan.lowerBound.cost, 9);
  });
});
