import type { KnapsackResult } from './knapsack';

/**
 * The largest q such that every value is a whole multiple of q (to `tol`), by Euclid's
 * algorithm on reals; 0 when there is none worth using (q smaller than `tol`).
 */
export function commonUnit(values: readonly number[], tol: number): number {
  let q = 0;
  for (const v of values) {
    let a = Math.abs(v);
    let b = q;
    while (b > tol) [a, b] = [b, a % b];
    q = a;
    if (q <= tol) return 0;
  }
  return values.every((v) => Math.abs(v / q - Math.round(v / q)) < 1e-6) ? q : 0;
}

/**
 * Bounded knapsack on an integer grid by dynamic programming, for every capacity at once. An
 * item whose bound does not limit it within the largest capacity is one unbounded pass; any
 * other is split into 1, 2, 4, … copies (0/1 passes). f[c] is the best value within capacity c
 * and one bit per pass and capacity lets each capacity's filling be read back, so one table
 * answers the pricing problem of every stock length in a round.
 *
 * @param weights item lengths in grid units (whole numbers)
 * @param capacities the capacities asked for, in grid units
 */
export function gridKnapsacks(
  values: readonly number[],
  weights: readonly number[],
  bounds: readonly number[],
  capacities: readonly number[],
): KnapsackResult[] {
  const top = Math.max(0, ...capacities);
  const width = top + 1;
  const passes: { item: number; copies: number; w: number; v: number; unbounded: boolean }[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    const w = weights[i]!;
    const fit = Math.floor(top / w);
    if (v <= 0 || fit <= 0 || bounds[i]! <= 0) continue;
    if (bounds[i]! >= fit) {
      passes.push({ item: i, copies: 1, w, v, unbounded: true });
      continue;
    }
    let left = bounds[i]!;
    for (let size = 1; left > 0; size *= 2) {
      const copies = Math.min(size, left);
      passes.push({ item: i, copies, w: copies * w, v: copies * v, unbounded: false });
      left -= copies;
    }
  }
  const f = new Float64Array(width);
  const take = new Uint8Array(passes.length * width);
  for (let k = 0; k < passes.length; k++) {
    const { w, v, unbounded } = passes[k]!;
    const row = k * width;
    if (unbounded) {
      // Forward: f[c − w] may already hold this item, so any number of copies is allowed.
      for (let c = w; c <= top; c++) {
        const candidate = f[c - w]! + v;
        if (candidate > f[c]! + 1e-12) {
          f[c] = candidate;
          take[row + c] = 1;
        }
      }
    } else {
      for (let c = top; c >= w; c--) {
        const candidate = f[c - w]! + v;
        if (candidate > f[c]! + 1e-12) {
          f[c] = candidate;
          take[row + c] = 1;
        }
      }
    }
  }
  return capacities.map((capacity) => {
    const counts = new Map<number, number>();
    let c = capacity;
    for (let k = passes.length - 1; k >= 0; k--) {
      const pass = passes[k]!;
      while (c >= pass.w && take[k * width + c]) {
        counts.set(pass.item, (counts.get(pass.item) ?? 0) + pass.copies);
        c -= pass.w;
        if (!pass.unbounded) break;
      }
    }
    const items = [...counts.keys()].sort((a, b) => a - b);
    return { value: f[capacity]!, items, counts: items.map((i) => counts.get(i)!), exact: true };
  });
}
