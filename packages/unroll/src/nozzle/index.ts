export * from './types.js';
export * from './layout-nozzle.js';
export * from './head-hole.js';
export * from './nozzle-text.js';
