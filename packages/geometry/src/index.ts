export * from './vec3.js';
export * from './types.js';
export * from './tolerances.js';
export * from './generators.js';
export * from './surfaces/line-intersection.js';
export * from './cone/index.js';
export * from './branch/index.js';
