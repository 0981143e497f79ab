export * from './girth-error-of.js';
