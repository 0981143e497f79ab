export * from './girth-error-of.js';
export * from './expect-close.js';
