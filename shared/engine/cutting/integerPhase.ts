import type { Master } from './columnGeneration';
import type { Instance } from './instance';
import { capPattern, firstFitDecreasing, patternKey, planCost, type Pattern } from './patterns';
import { mapSteps } from './steps';
import type { LpSolver } from './types';

/** Where the dive is: its step (1, 2, …) and the pieces it has still to place. */
export interface DiveStep {
  step: number;
  piecesLeft: number;
}

/**
 * Diving with residual re-solve: solve the LP of what is still to cut (column generation over
 * the shared pool, which keeps growing), fix every pattern at the integer part of its LP value,
 * or — when every value is below one — the pattern with the largest value at one board; take
 * the fixed boards' pieces off the demand and their boards off the stock on hand; repeat until
 * nothing is left. Past the deadline the rest is finished by first-fit decreasing. Null when
 * the stock on hand runs out on this path. Yields the pieces still to place after every
 * column-generation round and every step, so a caller can report progress inside the dive.
 */
export function* diveResidual(
  inst: Instance,
  master: Master,
  deadline: number,
  now: () => number,
  roundsPerStep = 25,
): Generator<DiveStep, Pattern[] | null> {
  const demand = inst.demand.slice();
  const available = inst.available.slice();
  const fixed: Pattern[] = [];
  const take = (pattern: Pattern, boards: number) => {
    for (let b = 0; b < boards && available[pattern.stock]! > 0; b++) {
      const board = capPattern(pattern, demand);
      if (board.items.length === 0) return;
      board.items.forEach((i, k) => (demand[i]! -= board.counts[k]!));
      available[pattern.stock]! -= 1;
      fixed.push(board);
    }
  };
  const finish = () => {
    const rest = firstFitDecreasing(inst, demand, available);
    return rest ? [...fixed, ...rest] : null;
  };
  const left = () => demand.reduce((sum, d) => sum + Math.max(0, d), 0);
  for (let step = 1; demand.some((d) => d > 0); step++) {
    if (now() > deadline) return finish();
    master.setResidual(demand, available);
    const lp = yield* mapSteps(
      master.rounds({ maxRounds: roundsPerStep, relativeGap: 1e-3 }),
      (): DiveStep => ({ step, piecesLeft: left() }),
    );
    if (lp.infeasible || lp.used.length === 0) return finish();
    let progressed = false;
    for (const u of lp.used) {
      const whole = Math.floor(u.value + 1e-6);
      if (whole > 0) {
        take(u.pattern, whole);
        progressed = true;
      }
    }
    if (!progressed) {
      const largest = lp.used.reduce((a, b) => (b.value > a.value ? b : a));
      take(largest.pattern, 1);
    }
    yield { step, piecesLeft: left() };
  }
  return fixed;
}

/**
 * The restricted master as a MIP over every pattern generated so far (HiGHS branch and cut),
 * started from the incumbent (if any): whole boards per pattern, covering the demand within the
 * stock on hand. Returns the boards (still to be tidied of surplus pieces) or null when it found
 * nothing better than the incumbent in its time.
 */
export function solvePoolMip(
  inst: Instance,
  lp: LpSolver,
  pool: readonly Pattern[],
  incumbent: readonly Pattern[],
  seconds: number,
): Pattern[] | null {
  const index = new Map<string, number>();
  const patterns: Pattern[] = [];
  for (const p of [...pool, ...incumbent]) {
    const key = patternKey(p);
    if (index.has(key) || inst.available[p.stock]! <= 0) continue;
    index.set(key, patterns.length);
    patterns.push(p);
  }
  const start = patterns.map(() => 0);
  for (const b of incumbent) start[index.get(patternKey(b))!]! += 1;
  const hasStart = incumbent.length > 0;
  const n = inst.demand.length;
  const limited = inst.available.map((a, s) => (Number.isFinite(a) ? s : -1)).filter((s) => s >= 0);
  const limitRow = new Map(limited.map((s, k) => [s, n + k]));
  const result = lp.solve({
    cost: patterns.map((p) => inst.cost[p.stock]!),
    columns: patterns.map((p) => {
      const row = limitRow.get(p.stock);
      return row === undefined
        ? { rows: p.items, values: p.counts }
        : { rows: [...p.items, row], values: [...p.counts, 1] };
    }),
    rowLower: [...inst.demand, ...limited.map(() => -Infinity)],
    rowUpper: [...inst.demand.map(() => Infinity), ...limited.map((s) => inst.available[s]!)],
    integer: true,
    ...(hasStart && { start }),
    timeLimit: seconds,
  });
  if (result.status !== 'optimal' && result.status !== 'limit') return null;
  if (result.x.length !== patterns.length) return null;
  const boards: Pattern[] = [];
  result.x.forEach((v, j) => {
    for (let k = 0; k < Math.round(v); k++) boards.push(patterns[j]!);
  });
  const covered = inst.demand.every(
    (d, i) => boards.reduce((sum, b) => sum + (b.counts[b.items.indexOf(i)] ?? 0), 0) >= d,
  );
  const incumbentCost = incumbent.length > 0 ? planCost(inst, incumbent) : Infinity;
  if (!covered || planCost(inst, boards) >= incumbentCost) return null;
  return boards;
}
