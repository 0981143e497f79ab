export * from './types.js';
export * from './options.js';
export { arcSweepDeg, checkTemplate, MAX_COORD_MM, MAX_LABEL_HEIGHT_MM, PRINT_NOTE } from '@girth/sheet';
export { templateToSvg } from './template-to-svg.js';
export { planToSvg } from './plan-to-svg.js';
export { GIRTH_SVG_NAMESPACE } from './sheet-document.js';
