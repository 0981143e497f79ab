export * from './types.js';
export * from './caution.js';
export * from './wrap/sample-cut.js';
export * from './wrap/develop-wrap.js';
export * from './cone/index.js';
export * from './branch/index.js';
export * from './plane-cut/index.js';
export * from './miter/index.js';
