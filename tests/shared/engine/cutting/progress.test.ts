import { beforeAll, describe, expect, it, vi } from 'vitest';
import {
  planCutting,
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
    const rounds = seen.filter((p) => p.stage === 'column-generation').map((p) => p.iterations);
    expect(rounds.length).toBeGreaterThan(0);
    expect(rounds).toEqual(rounds.map((_, i) => i + 1));
    expect(seen.at(-2)).toEqual({ stage: 'integer-phase', iterations: rounds.length });
    expect(seen.at(-1)).toEqual({ stage: 'done', iterations: rounds.length });
    expect(plan.boardCount).toBe(453);
    expect(planCutting(input, { lp, timeLimitMs: 10_000 }).boardCount).toBe(453);
  });

  it('without an LP solver: only done', () => {
    const seen: CuttingProgress[] = [];
    planCutting(input, { onProgress: (p) => seen.push(p) });
    expect(seen).toEqual([{ stage: 'done', iterations: 0 }]);
  });
});
