export * from './types.js';
export * from './limits.js';
export * from './cut-angle.js';
export * from './code-min-radius.js';
export * from './resolve-miter-spec.js';
export * from './miter-warnings.js';
export * from './elbow-geometry.js';
export * from './cut-list.js';
