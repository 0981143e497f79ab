/**
 * @girth/pdf: writes sheet plans (from `@girth/sheet`) as PDF at true size,
 * in vector: tiled on office paper (Letter, Legal, Tabloid, A4, A3) with an
 * assembly map, overlap strips, registration targets, trim marks and page
 * labels, or one page per roll width on a plotter roll; every page carries a
 * calibration square. `writePdf` also puts pages of text (a job's cover,
 * ordinate tables) in the same document, for a job packet.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/pdf
 */

export { planToPdf, writePdf } from './write-pdf.js';
export type { PdfInfo, PdfPart } from './write-pdf.js';
export { planTiles, pagesAlong, rowLetters, BAND_MM, CALIBRATION_SQUARE_MM, GUTTER_MM, MAX_PAGE_LENGTH_MM } from './tile-plan.js';
export type { Rect, Tile, TilePlan } from './tile-plan.js';
export { calibrationSquareAt, SQUARE_STROKE_MM } from './furniture.js';
export { resolvePdfOptions, DEFAULT_PAGE_OVERLAP_MM, DEFAULT_PRINT_MARGIN_MM, MAX_PAGES } from './options.js';
export type { Orientation, PdfOptions, ResolvedPdfOptions } from './options.js';
export { PAPERS, PAPER_NAMES } from './paper.js';
export type { Paper, PaperName } from './paper.js';
