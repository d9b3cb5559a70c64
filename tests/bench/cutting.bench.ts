/**
 * Lumber-plan benchmark (`npm run bench`; a script, not a test): an order of about 5,000
 * pieces from real designs (tests/bench/lumberOrder.ts), every lumber planned separately, with
 * unlimited stock and with counts on hand that force other lengths. Prints the wall time of the
 * whole order (median of 3 after a warm-up) and the gap of the plans' total cost to the sum of
 * their lower bounds. Goal: under 2 s and within 0.1 %.
 */
import { planCutting, type CuttingInput } from '../../shared/engine/cutting';
import { MM_PER_INCH } from '../../shared/engine/units';
import { loadLpSolver } from '../../server/services/lp';
import { benchInputs } from './lumberOrder';

const lp = await loadLpSolver();
const order = benchInputs();
const pieces = order.reduce((n, o) => n + o.input.pieces.reduce((m, p) => m + p.quantity, 0), 0);

function planAll(inputs: { lumber: string; input: CuttingInput }[]) {
  const t0 = performance.now();
  const plans = inputs.map(({ input }) => planCutting(input, { lp, timeLimitMs: 400 }));
  const ms = performance.now() - t0;
  const cost = plans.reduce((s, p) => s + p.totalCost, 0);
  const bound = plans.reduce((s, p) => s + p.lowerBound.cost, 0);
  const ffd = plans.reduce((s, p) => s + (p.firstFitDecreasing?.totalCost ?? NaN), 0);
  const boards = plans.reduce((s, p) => s + p.boardCount, 0);
  return { ms, cost, bound, ffd, boards, plans };
}

function report(label: string, inputs: { lumber: string; input: CuttingInput }[]) {
  planAll(inputs); // warm-up
  const runs = [planAll(inputs), planAll(inputs), planAll(inputs)].sort((a, b) => a.ms - b.ms);
  const r = runs[1]!;
  const gap = ((r.cost - r.bound) / r.bound) * 100;
  console.log(
    `${label}: ${r.ms.toFixed(0)} ms (runs ${runs.map((x) => x.ms.toFixed(0)).join(' / ')}), ` +
      `${r.boards} boards, $${r.cost.toFixed(2)} vs bound $${r.bound.toFixed(2)} → gap ${gap.toFixed(3)} %; ` +
      `first-fit decreasing $${r.ffd.toFixed(2)} (+${(((r.ffd - r.cost) / r.cost) * 100).toFixed(1)} %)`,
  );
  return r;
}

console.log(`Node ${process.version}; ${pieces} pieces in ${order.length} lumbers:`);
for (const { lumber, input } of order) {
  const n = input.pieces.reduce((m, p) => m + p.quantity, 0);
  console.log(`  ${lumber}: ${n} pieces, ${input.pieces.length} lengths`);
}
const free = report('unlimited stock', order);

// Counts on hand: of the two lengths each lumber's plan uses most (other than the longest, which
// stays unlimited so that every piece still has a board), only 60 % are in the rack.
const limited = order.map(({ lumber, input }, k) => {
  const used = new Map<number, number>();
  const longest = input.stocks.length - 1;
  for (const b of free.plans[k]!.boards) {
    if (b.stockIndex !== longest) used.set(b.stockIndex, (used.get(b.stockIndex) ?? 0) + 1);
  }
  const top = [...used].sort((a, b) => b[1] - a[1]).slice(0, 2);
  const stocks = input.stocks.map((s, i) => {
    const hit = top.find(([index]) => index === i);
    return hit ? { ...s, available: Math.floor(hit[1] * 0.6) } : s;
  });
  return { lumber, input: { ...input, stocks } };
});
const tight = report('with counts on hand', limited);
const shortLengths = limited
  .flatMap((o) => o.input.stocks.filter((s) => s.available !== undefined))
  .map((s) => `${Math.round(s.length / MM_PER_INCH / 12)} ft × ${s.available}`);
console.log(`  on hand (limited lengths): ${shortLengths.join(', ')}`);
console.log(
  `  optimal plans: ${tight.plans.filter((p) => p.optimal).length} of ${tight.plans.length}`,
);
