/** Plane-frame analysis by the direct stiffness method: beam-columns with end releases. */
export type * from './types';
export { prepareFrame, type PreparedFrame } from './prepare';
export { solveFrame } from './solve';
