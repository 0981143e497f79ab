export * from './types.js';
export * from './branch-text.js';
export * from './header-hole.js';
export * from './layout-branch.js';
