export * from './types.js';
export * from './layers.js';
export * from './tolerances.js';
export * from './dxf-text.js';
export * from './template-to-dxf.js';
