export * from './ordinate-reference.js';
export * from './cut-depth.js';
export * from './ordinates-from.js';
export * from './reference-lines.js';
export * from './angle-check.js';
export * from './branch-fit-up.js';
export * from './miter-fit-up.js';
export * from './plane-cut-fit-up.js';
