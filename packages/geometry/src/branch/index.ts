export * from './types.js';
export * from './resolve-branch-spec.js';
export * from './branch-frame.js';
export * from './branch-warnings.js';
export * from './solve-branch.js';
