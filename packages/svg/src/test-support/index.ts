export * from './golden.js';
export * from './parse.js';
export * from './path-geometry.js';
export * from './render.js';
export * from './expect-close.js';
export * from './fixtures.js';
