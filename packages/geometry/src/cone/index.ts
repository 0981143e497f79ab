export * from './types.js';
export * from './frustum.js';
export * from './apex-angle.js';
export * from './sheet.js';
export * from './frustum-surface.js';
