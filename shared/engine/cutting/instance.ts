import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import { commonUnit } from './knapsackGrid';
import type { CuttingInput } from './types';

/**
 * The order as the solver sees it: pieces grouped by length (longest first) with each piece's
 * "weight" length + kerf, and each stock's capacity length − trim + kerf, so that a board holds
 * pieces p₁…p_k exactly when Σ(pᵢ + kerf) ≤ capacity, i.e. Σpᵢ + (k−1)·kerf + trim ≤ length.
 */
export interface Instance {
  lengths: number[];
  weights: number[];
  demand: number[];
  ids: { id?: string; quantity: number }[][];
  stockLength: number[];
  capacity: number[];
  cost: number[];
  /** Boards on hand per stock, Infinity when unlimited. */
  available: number[];
  kerf: number;
  trim: number;
  /** Absolute slack on every fit test. */
  eps: number;
  /**
   * When every weight and capacity lies on a common grid of at most `GRID_LIMIT` steps per
   * board: the weights and capacities in grid steps (pricing is then a table, not a search).
   */
  grid: { weights: number[]; capacity: number[] } | null;
}

/** Longest board, in grid steps, for which pricing uses the table (20 ft at 1/32 in ≈ 7,700). */
const GRID_LIMIT = 20_000;

const finite = (v: number, min: number) => Number.isFinite(v) && v >= min;

/** Checks the input and builds the instance; refuses what no plan can satisfy. */
export function buildInstance(input: CuttingInput): Instance {
  const kerf = input.kerf ?? 0;
  const trim = input.trim ?? 0;
  if (!finite(kerf, 0) || !finite(trim, 0)) {
    throw new EngineError('invalid', 'Kerf and trim must be zero or positive numbers.');
  }
  if (input.stocks.length === 0) throw new EngineError('invalid', 'No stock lengths given.');
  for (const s of input.stocks) {
    if (!finite(s.length, 0) || s.length <= 0 || !finite(s.cost, 0)) {
      throw new EngineError('invalid', 'Every stock needs a positive length and a cost ≥ 0.');
    }
    if (s.available !== undefined && !(Number.isInteger(s.available) && s.available >= 0)) {
      throw new EngineError('invalid', 'A stock’s count on hand must be a whole number ≥ 0.');
    }
  }
  const maxStock = Math.max(...input.stocks.map((s) => s.length));
  const eps = TOLERANCE * maxStock;
  const byLength = new Map<number, { length: number; ids: Instance['ids'][number] }>();
  for (const p of input.pieces) {
    if (
      !finite(p.length, 0) ||
      p.length <= 0 ||
      !(Number.isInteger(p.quantity) && p.quantity >= 0)
    ) {
      throw new EngineError(
        'invalid',
        'Every piece needs a positive length and a whole quantity ≥ 0.',
      );
    }
    if (p.quantity === 0) continue;
    // Lengths equal to within the tolerance are the same piece for the saw.
    const key = Math.round(p.length / (eps || 1e-12));
    const entry = byLength.get(key) ?? { length: p.length, ids: [] };
    entry.ids.push({ id: p.id, quantity: p.quantity });
    byLength.set(key, entry);
  }
  const groups = [...byLength.values()].sort((a, b) => b.length - a.length);
  const inst: Instance = {
    lengths: groups.map((g) => g.length),
    weights: groups.map((g) => g.length + kerf),
    demand: groups.map((g) => g.ids.reduce((n, i) => n + i.quantity, 0)),
    ids: groups.map((g) => g.ids),
    stockLength: input.stocks.map((s) => s.length),
    capacity: input.stocks.map((s) => s.length - trim + kerf),
    cost: input.stocks.map((s) => s.cost),
    available: input.stocks.map((s) => s.available ?? Infinity),
    kerf,
    trim,
    eps,
    grid: null,
  };
  const unit = commonUnit([...inst.weights, ...inst.capacity], eps);
  if (unit > 0 && Math.max(...inst.capacity) / unit <= GRID_LIMIT) {
    inst.grid = {
      weights: inst.weights.map((w) => Math.round(w / unit)),
      capacity: inst.capacity.map((c) => Math.round(c / unit)),
    };
  }
  const longest = inst.lengths[0];
  if (longest !== undefined && !inst.capacity.some((c) => inst.weights[0]! <= c + eps)) {
    throw new EngineError(
      'piece_too_long',
      `A piece of ${longest} is longer than every stock length less the trim (${maxStock} − ${trim}).`,
      { length: longest },
    );
  }
  if (longest !== undefined) {
    const onHand = inst.capacity.some(
      (c, s) => inst.weights[0]! <= c + eps && inst.available[s]! > 0,
    );
    if (!onHand) {
      throw new EngineError(
        'not_enough_stock',
        `No board on hand is long enough for a piece of ${longest}.`,
        { length: longest },
      );
    }
  }
  return inst;
}

/** Total piece length of a board's counts (sparse item indices and counts). */
export const pieceLength = (inst: Instance, items: number[], counts: number[]) =>
  items.reduce((sum, i, k) => sum + inst.lengths[i]! * counts[k]!, 0);

/** Σ(weight × count): what a board's pieces take of its capacity. */
export const usedCapacity = (inst: Instance, items: number[], counts: number[]) =>
  items.reduce((sum, i, k) => sum + inst.weights[i]! * counts[k]!, 0);
