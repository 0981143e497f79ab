export * from './types.js';
export * from './cylinder.js';
export * from './plane.js';
export * from './cone.js';
export * from './table.js';
export * from './line-intersection.js';
export * from './grazing.js';
