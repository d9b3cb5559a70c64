export * from './columnStability';
export * from './interaction';
export * from './checkMember';
export * from './bearing';
export * from './shear';
export * from './beamStability';
