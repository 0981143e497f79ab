/**
 * @girth/svg: draws a Girth `Template` as an SVG sheet at true physical size
 * (`templateToSvg`), with a title block, the caution and a calibration bar.
 * The sheet is planned once by `@girth/sheet`; `planToSvg` writes a plan.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/svg
 */

export { templateToSvg } from './template-to-svg.js';
export { planToSvg } from './plan-to-svg.js';
export { GIRTH_SVG_NAMESPACE } from './sheet-document.js';
export type { SheetUnits, SvgOptions, ResolvedSvgOptions } from './types.js';
export {
  resolveSvgOptions,
  DEFAULT_MARGIN_MM,
  DEFAULT_OVERLAP_MM,
  MAX_MARGIN_MM,
  MAX_OVERLAP_MM,
  MAX_LABEL_CHARS,
} from './options.js';
export { checkTemplate, MAX_COORD_MM, MAX_LABEL_HEIGHT_MM, PRINT_NOTE } from '@girth/sheet';
