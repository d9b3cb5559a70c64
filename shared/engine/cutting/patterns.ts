import { usedCapacity, type Instance } from './instance';

/** One board's cutting pattern: a stock and how many of each piece length (sparse). */
export interface Pattern {
  stock: number;
  /** Item indices, ascending (longest piece first). */
  items: number[];
  counts: number[];
}

/** Key of a pattern, for de-duplicating the column pool. */
export const patternKey = (p: Pattern) =>
  `${p.stock}|${p.items.map((i, k) => `${i}x${p.counts[k]}`).join(',')}`;

/** The pattern with every count capped at `limit` (pieces no longer needed are left off). */
export function capPattern(p: Pattern, limit: readonly number[]): Pattern {
  const items: number[] = [];
  const counts: number[] = [];
  p.items.forEach((i, k) => {
    const c = Math.min(p.counts[k]!, limit[i]!);
    if (c > 0) {
      items.push(i);
      counts.push(c);
    }
  });
  return { stock: p.stock, items, counts };
}

/** Cost of a list of boards. */
export const planCost = (inst: Instance, boards: readonly Pattern[]) =>
  boards.reduce((sum, b) => sum + inst.cost[b.stock]!, 0);

/**
 * Removes pieces beyond the demand (a covering plan may cut a few too many), drops boards left
 * empty, then gives every board the cheapest stock that holds it with boards still on hand.
 * Largest boards choose first; a stock that fits a board fits every smaller one, so this never
 * runs out where the plan it starts from did not.
 */
export function tidyPlan(inst: Instance, boards: readonly Pattern[]): Pattern[] {
  const surplus = inst.demand.map((d) => -d);
  for (const b of boards) b.items.forEach((i, k) => (surplus[i]! += b.counts[k]!));
  // Take surplus off the emptiest boards first: they may empty and need no board at all.
  const byUse = [...boards].sort(
    (a, b) => usedCapacity(inst, a.items, a.counts) - usedCapacity(inst, b.items, b.counts),
  );
  const trimmed: Pattern[] = [];
  for (const b of byUse) {
    const counts = b.counts.map((c, k) => {
      const i = b.items[k]!;
      const off = Math.min(c, Math.max(0, surplus[i]!));
      surplus[i]! -= off;
      return c - off;
    });
    const items = b.items.filter((_, k) => counts[k]! > 0);
    const kept = counts.filter((c) => c > 0);
    if (items.length > 0) trimmed.push({ stock: b.stock, items, counts: kept });
  }
  const left = inst.available.slice();
  const sized = trimmed
    .map((b) => ({ b, used: usedCapacity(inst, b.items, b.counts) }))
    .sort((x, y) => y.used - x.used);
  return sized.map(({ b, used }) => {
    let stock = -1;
    inst.capacity.forEach((cap, s) => {
      if (cap + inst.eps < used || left[s]! <= 0) return;
      if (
        stock < 0 ||
        inst.cost[s]! < inst.cost[stock]! ||
        (inst.cost[s] === inst.cost[stock] && cap < inst.capacity[stock]!)
      )
        stock = s;
    });
    if (stock < 0) stock = b.stock; // unreachable by the argument above; keep the board as it was
    left[stock]! -= 1;
    return { ...b, stock };
  });
}

/**
 * First-fit decreasing over several stock lengths: longest pieces first, each into the first
 * open board with room, else a new board of the longest stock still on hand that holds it;
 * then `tidyPlan` moves every board to its cheapest fitting stock. Null when the stock on hand
 * runs out.
 */
export function firstFitDecreasing(
  inst: Instance,
  demand: readonly number[] = inst.demand,
  available: readonly number[] = inst.available,
): Pattern[] | null {
  const left = available.slice();
  const open: { stock: number; room: number; counts: Map<number, number> }[] = [];
  for (let i = 0; i < demand.length; i++) {
    const w = inst.weights[i]!;
    let remaining = demand[i]!;
    for (const board of open) {
      if (remaining === 0) break;
      const fit = Math.min(remaining, Math.floor((board.room + inst.eps) / w));
      if (fit <= 0) continue;
      board.room -= fit * w;
      board.counts.set(i, (board.counts.get(i) ?? 0) + fit);
      remaining -= fit;
    }
    while (remaining > 0) {
      let stock = -1;
      inst.capacity.forEach((cap, s) => {
        if (left[s]! > 0 && cap + inst.eps >= w && (stock < 0 || cap > inst.capacity[stock]!))
          stock = s;
      });
      if (stock < 0) return null;
      left[stock]! -= 1;
      const fit = Math.min(remaining, Math.floor((inst.capacity[stock]! + inst.eps) / w));
      open.push({ stock, room: inst.capacity[stock]! - fit * w, counts: new Map([[i, fit]]) });
      remaining -= fit;
    }
  }
  const boards = open.map((b) => {
    const items = [...b.counts.keys()].sort((x, y) => x - y);
    return { stock: b.stock, items, counts: items.map((i) => b.counts.get(i)!) };
  });
  const tidied = tidyPlan(
    { ...inst, demand: demand.slice(), available: available.slice() },
    boards,
  );
  return tidied;
}
