export * from './types.js';
export * from './weld-prep-branch.js';
export * from './weld-prep-cuts.js';
export * from './with-weld-prep.js';
export * from './branch-od-cut.js';
