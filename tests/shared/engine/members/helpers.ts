/** Exact conversions for imperial worked examples: 1 lbf in N, 1 lbf·in in N·mm. */
export const LB_N = 4.4482216152605;
export const LB_IN = 4.4482216152605 * 25.4;
