/**
 * The glue tab of a wrap: paper that runs `overlapMm` past the stretch-out so
 * the wrap's ends overlap and station 1 can be laid exactly on the line where
 * the girth closes.
 */
import { FONT_MM } from '../style.js';
import type { Box } from '../internal/box.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import { textWidthMm } from '../internal/text-metrics.js';

/** The words on the tab. */
export const OVERLAP_TEXT = 'overlap — align station 1 here';

/** Gap between the tab and level words beside it, mm. */
const LEVEL_GAP_MM = 2;
/** Smallest size of the words running up the tab, mm. */
const MIN_FONT_MM = 2;
/** Smallest tab height drawn, mm, when the template itself is flatter than that. */
const MIN_TAB_HEIGHT_MM = 12;

/** Where the tab and its words go, template mm. */
export interface OverlapPlan {
  /** The tab: from the stretch-out to the stretch-out plus the overlap, over the template's height. */
  readonly tab: Box;
  /** The words: turned to run up the tab when they fit in it (at 2 to 3 mm), else level, beside its far edge. */
  readonly text: CentredText & { readonly vertical: boolean };
  /** Tab and words together. */
  readonly box: Box;
}

/**
 * Plans the glue tab of a wrap whose drawing spans `geometry` (template mm).
 *
 * @param stretchOutMm - where the girth closes (x of the tab's near edge), mm.
 * @param overlapMm - width of the tab, mm, more than 0.
 * @example planOverlap(box, 528.652, 25).tab.maxX // 553.652
 */
export function planOverlap(geometry: Box, stretchOutMm: number, overlapMm: number): OverlapPlan {
  const mid = (geometry.minY + geometry.maxY) / 2;
  const half = Math.max(geometry.maxY - geometry.minY, MIN_TAB_HEIGHT_MM) / 2;
  const tab: Box = { minX: stretchOutMm, maxX: stretchOutMm + overlapMm, minY: mid - half, maxY: mid + half };
  // Run the words up the tab, smaller if need be (down to MIN_FONT_MM); else set them level.
  const fontMm = Math.min(FONT_MM.overlap, (2 * half - 2) / textWidthMm(OVERLAP_TEXT, 1));
  const fitsUp = fontMm >= MIN_FONT_MM && fontMm * 1.4 <= overlapMm;
  if (fitsUp) {
    const t = centredText([OVERLAP_TEXT], [(tab.minX + tab.maxX) / 2, mid], fontMm);
    return { tab, text: { ...t, vertical: true }, box: tab };
  }
  // Level words go beside the tab's far edge, where nothing else is drawn.
  const levelFontMm = FONT_MM.overlap;
  const levelAlong = textWidthMm(OVERLAP_TEXT, levelFontMm);
  const t = centredText([OVERLAP_TEXT], [tab.maxX + LEVEL_GAP_MM + levelAlong / 2, mid], levelFontMm);
  const box: Box = {
    minX: tab.minX,
    maxX: Math.max(tab.maxX, t.box.maxX),
    minY: Math.min(tab.minY, t.box.minY),
    maxY: Math.max(tab.maxY, t.box.maxY),
  };
  return { tab, text: { ...t, vertical: false }, box };
}
