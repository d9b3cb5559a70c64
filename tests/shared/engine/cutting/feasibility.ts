import type { CuttingInput, CuttingPlan } from '../../../../shared/engine/cutting';

/**
 * Independent check of a plan against its order: every board's pieces + one kerf between
 * neighbours + the trim fit its stock, the stated offcut is what is left, the demand is met
 * exactly per length, no stock is used beyond its count on hand, and the cost adds up.
 * Returns a list of problems (empty when the plan is feasible).
 */
export function planProblems(input: CuttingInput, plan: CuttingPlan): string[] {
  const problems: string[] = [];
  const kerf = input.kerf ?? 0;
  const trim = input.trim ?? 0;
  const eps = 1e-6 * Math.max(...input.stocks.map((s) => s.length));
  const used = input.stocks.map(() => 0);
  const cut = new Map<number, number>();
  let cost = 0;
  plan.boards.forEach((b, n) => {
    const stock = input.stocks[b.stockIndex];
    if (!stock || stock.length !== b.stock) problems.push(`board ${n}: unknown stock`);
    used[b.stockIndex]! += 1;
    cost += stock?.cost ?? 0;
    const total = b.pieces.reduce((s, p) => s + p.length, 0) + (b.pieces.length - 1) * kerf + trim;
    if (total > b.stock + eps) problems.push(`board ${n}: ${total} > ${b.stock}`);
    if (Math.abs(b.stock - total - b.offcut) > eps) problems.push(`board ${n}: offcut ${b.offcut}`);
    if (b.pieces.length === 0) problems.push(`board ${n}: empty`);
    for (const p of b.pieces) cut.set(p.length, (cut.get(p.length) ?? 0) + 1);
  });
  const wanted = new Map<number, number>();
  for (const p of input.pieces) wanted.set(p.length, (wanted.get(p.length) ?? 0) + p.quantity);
  for (const [length, q] of wanted) {
    if ((cut.get(length) ?? 0) !== q)
      problems.push(`length ${length}: cut ${cut.get(length) ?? 0} of ${q}`);
  }
  for (const [length] of cut)
    if (!wanted.has(length)) problems.push(`length ${length}: not ordered`);
  input.stocks.forEach((s, i) => {
    if (s.available !== undefined && used[i]! > s.available) {
      problems.push(`stock ${s.length}: ${used[i]} boards of ${s.available} on hand`);
    }
  });
  if (Math.abs(cost - plan.totalCost) > 1e-6 * Math.max(1, cost))
    problems.push(`cost ${plan.totalCost} ≠ ${cost}`);
  if (plan.boardCount !== plan.boards.length) problems.push('boardCount');
  return problems;
}
