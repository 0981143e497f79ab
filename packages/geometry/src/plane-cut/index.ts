export * from './fit-surface.js';
export * from './types.js';
export * from './limits.js';
export * from './plane-cut-geometry.js';
