export * from './snow';
export * from './combinations';
export * from './areaLoads';
