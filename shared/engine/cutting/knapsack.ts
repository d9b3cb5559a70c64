/** The best filling of one board found by `boundedKnapsack`. */
export interface KnapsackResult {
  value: number;
  /** Item indices used (into the arrays passed in, ascending) and how many of each. */
  items: number[];
  counts: number[];
  /** False when the node limit stopped the search before it was proven best. */
  exact: boolean;
}

/**
 * Bounded integer knapsack by depth-first branch and bound: maximise Σ vᵢaᵢ subject to
 * Σ wᵢaᵢ ≤ capacity, 0 ≤ aᵢ ≤ boundᵢ integer. Items are tried in order of value per length,
 * each node bounded by the fractional (Dantzig) relaxation of the rest. Works on real-valued
 * lengths (no grid), which is why it is a search and not a table.
 *
 * @param eps slack on the capacity test
 * @param nodeLimit nodes before giving up on proving optimality (the best found is returned)
 */
export function boundedKnapsack(
  values: readonly number[],
  weights: readonly number[],
  bounds: readonly number[],
  capacity: number,
  eps: number,
  nodeLimit = 500_000,
): KnapsackResult {
  const order: number[] = [];
  for (let i = 0; i < values.length; i++) {
    if (values[i]! > 0 && bounds[i]! > 0 && weights[i]! <= capacity + eps) order.push(i);
  }
  order.sort((a, b) => values[b]! / weights[b]! - values[a]! / weights[a]!);
  const n = order.length;
  const v = order.map((i) => values[i]!);
  const w = order.map((i) => weights[i]!);
  const u = order.map((i, k) => Math.min(bounds[i]!, Math.floor((capacity + eps) / w[k]!)));
  const current = new Array<number>(n).fill(0);
  let best = 0;
  let bestCounts = new Array<number>(n).fill(0);
  let nodes = 0;
  let exact = true;
  const minTail = new Array<number>(n + 1).fill(Infinity);
  for (let k = n - 1; k >= 0; k--) minTail[k] = Math.min(minTail[k + 1]!, w[k]!);

  const upperBound = (k: number, room: number) => {
    let bound = 0;
    for (let j = k; j < n && room > eps; j++) {
      const take = Math.min(u[j]!, room / w[j]!);
      bound += take * v[j]!;
      room -= take * w[j]!;
    }
    return bound;
  };

  const search = (k: number, room: number, value: number) => {
    if (value > best + 1e-12) {
      best = value;
      bestCounts = current.slice();
    }
    if (k >= n || room + eps < minTail[k]!) return;
    if (++nodes > nodeLimit) {
      exact = false;
      return;
    }
    if (value + upperBound(k, room) <= best * (1 + 1e-12) + 1e-12) return;
    const most = Math.min(u[k]!, Math.floor((room + eps) / w[k]!));
    for (let a = most; a >= 0; a--) {
      current[k] = a;
      search(k + 1, room - a * w[k]!, value + a * v[k]!);
      if (!exact) break;
    }
    current[k] = 0;
  };
  search(0, capacity, 0);

  const chosen = bestCounts
    .map((c, k) => ({ item: order[k]!, count: c }))
    .filter((e) => e.count > 0)
    .sort((a, b) => a.item - b.item);
  return {
    value: best,
    items: chosen.map((e) => e.item),
    counts: chosen.map((e) => e.count),
    exact,
  };
}
