/**
 * @girth/dxf: writes a Girth `Template` as a DXF flat pattern for a plasma or
 * CNC table (`templateToDxf`): AC1021 through dxf-writer, or R12 written here.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/dxf
 */

export type { DxfVersion, DxfUnits, DxfLayerRole, DxfLayer, DxfOptions, DxfWriteOptions, DxfTextMode, DxfCurveMode } from './types.js';
export { DXF_LAYERS, DXF_LAYER_ORDER } from './layers.js';
export {
  JOIN_EPS_MM,
  COORD_DECIMALS,
  ANGLE_DECIMALS,
  BULGE_DECIMALS,
  MAX_COORD_MM,
  MAX_TEXT_CHARS,
  ARC_TOLERANCE_MM,
  ARC_SAMPLE_SHARE,
} from './tolerances.js';
export { dxfSafeText } from './dxf-text.js';
export { templateToDxf, planToDxf } from './template-to-dxf.js';
export { fitArcs, kinkIndices, KINK_TURN_DEG, KINK_MIN_TURN_DEG, KINK_RATIO, type ArcFit } from './internal/fit-arcs.js';
export { fitTemplateArcs, type FittedTemplate } from './internal/fit-template.js';
export type { SheetVertex } from './internal/sheet.js';
