export * from './types.js';
export * from './layout-trunnion.js';
export * from './elbow-hole.js';
export * from './trunnion-text.js';
