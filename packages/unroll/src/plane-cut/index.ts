export * from './layout-options.js';
export * from './types.js';
export * from './plane-cut-text.js';
export * from './layout-plane-cut.js';
