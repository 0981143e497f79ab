/**
 * @girth/sheet: plans the sheet of a template once (`planSheet`): every cut
 * and mark line, station number, label, title-block line and calibration mark
 * in mm with its role and layer. The SVG and DXF writers (and later the PDF and
 * the page's canvas) only write a plan; `checkTemplate` and `checkPlan` run
 * once where the data is made.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/sheet
 */

export { planSheet } from './plan-sheet.js';
export { EMPTY_BOX, arcBox, growBox, partBox, pointsBox, unionBox } from './internal/box.js';
export { textWidthMm } from './internal/text-metrics.js';
export { textLines } from './internal/text-lines.js';
export type { Box, ResolvedSheetOptions, SheetItem, SheetLayer, SheetOptions, SheetPath, SheetPathRole, SheetPlan, SheetRect, SheetRectRole, SheetText, SheetTextRole, SheetUnits } from './types.js';
export { DEFAULT_MARGIN_MM, DEFAULT_OVERLAP_MM, MAX_LABEL_CHARS, MAX_MARGIN_MM, MAX_OVERLAP_MM, TEXT_SCALE_RANGE, resolveSheetOptions } from './options.js';
export { MAX_COORD_MM, MAX_LABEL_HEIGHT_MM, arcSweepDeg, checkTemplate } from './check-template.js';
export { checkPlan } from './check-plan.js';
export { PRINT_NOTE } from './print-note.js';
export { ASCENT_EM, CALIBRATION, CAP_HEIGHT_EM, DASH_MM, DESCENT_EM, FONT_FAMILY, FONT_MM, HATCH_SPACING_MM, INK, LINE_EM, MAX_STROKE_MM, MIN_CAP_MM, MIN_SHEET_WIDTH_MM, STATION_NUMBER_GAP_MM, STROKE_MM, TEXT_INSET_EM, TITLE_GAP_MM } from './style.js';

