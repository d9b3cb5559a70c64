/**
 * The truss engine's public surface: pure, SI inside (mm, N, MPa, N/mm), runs in the browser
 * and in Node. Apps import from here; the folders behind it are free to change shape.
 */
export * from './analysis';
export * from './profiles';
export * from './loads';
export * from './lumber';
export * from './members';
export * from './plates';
export * from './format';
export * from './design';
export * from './frame';
export * from './units';
export * from './cutting';
export { EngineError, isEngineError, type EngineErrorCode } from './errors';
export { ENGINE_VERSION } from './version';
export * from './pieces';
export * from './schedule';
