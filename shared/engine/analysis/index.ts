/** Plane-truss analysis: validation, equilibrium (method of joints as a matrix), stiffness. */
export type * from './types';
export { validateModel, memberId, type ValidationIssue } from './validate';
export { prepareTruss, type PreparedTruss } from './prepare';
export { solveLoads, analyzeTruss, RESIDUAL_LIMIT } from './solve';
export { unitLoadDeflection } from './virtualWork';
