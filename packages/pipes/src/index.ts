export * from './errors.js';
export * from './validate.js';
export * from './length/units.js';
export * from './length/unit-names.js';
export * from './length/fraction.js';
export * from './length/parse.js';
export * from './length/format.js';
