/** Lumber plans: which stock boards to pull and what to cut from each, at least cost. */
export { planCutting, planCuttingSteps, costGrid, roundUpBound } from './plan';
export { drain } from './steps';
export { boundedKnapsack, type KnapsackResult } from './knapsack';
export type * from './types';
