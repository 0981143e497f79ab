export * from './errors.js';
export * from './validate.js';
