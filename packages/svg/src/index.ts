export * from './types.js';
export * from './options.js';
export * from './check-template.js';
export * from './print-note.js';
export { templateToSvg } from './template-to-svg.js';
export { GIRTH_SVG_NAMESPACE } from './sheet-document.js';
