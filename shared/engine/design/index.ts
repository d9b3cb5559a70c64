/** The full truss design: profile, loads, member checks with auto-sizing, deflection, plates. */
export { designTruss, STANDARD_HEEL_MAX_MM } from './designTruss';
export { presentDesign } from './present';
export type * from './present';
export { DESIGN_CAUTIONS } from './cautions';
export { DEFAULT_LUMBER, lumberCandidates } from './lumberChoice';
export { effectiveLengths } from './sizing';
export { axialStiffness } from './deflection';
export type * from './types';
export type { AreaLoad, EngineDesignInput } from './input';
export { trussLumberMassKg } from './weight';
