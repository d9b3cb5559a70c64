export * from './sizes';
export * from './referenceValues';
export * from './ids';
export * from './factors';
export * from './designValues';
export * from './cost';
export * from './weight';
