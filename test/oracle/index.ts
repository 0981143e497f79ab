export * from './vec3.js';
export * from './root-finding.js';
export * from './generator-cut.js';
export * from './branch-oracle.js';
