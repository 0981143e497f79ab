export * from './types.js';
export * from './develop-two-cut-wrap.js';
export * from './miter-text.js';
export * from './layout-miter.js';
