export * from './types.js';
export * from './elbow-spec.js';
export * from './solve-trunnion.js';
