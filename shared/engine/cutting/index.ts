/** Lumber plans: which stock boards to pull and what to cut from each, at least cost. */
export { planCutting, costGrid, roundUpBound } from './plan';
export { boundedKnapsack, type KnapsackResult } from './knapsack';
export type * from './types';
