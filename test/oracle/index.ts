export * from './vec3.js';
export * from './root-finding.js';
export * from './generator-cut.js';
export * from './branch-oracle.js';
export * from './girth-extreme.js';
export * from './plane-cut-oracle.js';
export * from './miter-oracle.js';
export * from './dihedral-oracle.js';
