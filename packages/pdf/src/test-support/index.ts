/**
 * Test helpers of @girth/pdf, from source only (never built): rendering and
 * reading PDFs with poppler-utils, qpdf's check, and the test sheets.
 */
export { pageText, pageTexts, qpdfCheck, readPgm, renderPages, runCentre, type Crop, type Grey } from './raster.js';
export { nps12LateralWrapPlan, nps24Lateral, nps24LateralWrapPlan } from './lateral.js';
