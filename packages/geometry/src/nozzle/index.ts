export * from './types.js';
export * from './head-spec.js';
export * from './solve-nozzle.js';
