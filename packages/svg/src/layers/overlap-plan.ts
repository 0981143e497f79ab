/**
 * The glue tab of a wrap: paper that runs `overlapMm` past the stretch-out so
 * the wrap's ends overlap and station 1 can be laid exactly on the line where
 * the girth closes.
 */
import { FONT_MM, CAP_HEIGHT_EM } from '../style.js';
import type { Box } from '../internal/box.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import { textWidthMm } from '../internal/text-metrics.js';

/** The words on the tab. */
export const OVERLAP_TEXT = 'overlap — align station 1 here';

/** Smallest tab height drawn, mm, when the template itself is flatter than that. */
const MIN_TAB_HEIGHT_MM = 12;

/** Where the tab and its words go, template mm. */
export interface OverlapPlan {
  /** The tab: from the stretch-out to the stretch-out plus the overlap, over the template's height. */
  readonly tab: Box;
  /** The words: turned to run up the tab when they fit in it, else level beside it, below its foot. */
  readonly text: CentredText & { readonly vertical: boolean };
  /** Tab and words together. */
  readonly box: Box;
}

/**
 * Plans the glue tab of a wrap whose drawing spans `geometry` (template mm).
 *
 * @param stretchOutMm - where the girth closes (x of the tab's near edge), mm.
 * @param overlapMm - width of the tab, mm, more than 0.
 */
export function planOverlap(geometry: Box, stretchOutMm: number, overlapMm: number): OverlapPlan {
  const mid = (geometry.minY + geometry.maxY) / 2;
  const half = Math.max(geometry.maxY - geometry.minY, MIN_TAB_HEIGHT_MM) / 2;
  const tab: Box = { minX: stretchOutMm, maxX: stretchOutMm + overlapMm, minY: mid - half, maxY: mid + half };
  const fontMm = FONT_MM.overlap;
  const along = textWidthMm(OVERLAP_TEXT, fontMm);
  const fitsUp = along <= 2 * half - 2 && fontMm * 1.4 <= overlapMm;
  if (fitsUp) {
    const t = centredText([OVERLAP_TEXT], [(tab.minX + tab.maxX) / 2, mid], fontMm);
    return { tab, text: { ...t, vertical: true }, box: tab };
  }
  const cap = CAP_HEIGHT_EM * fontMm;
  const t = centredText([OVERLAP_TEXT], [tab.minX + along / 2, tab.minY - 2 - cap / 2], fontMm);
  const box: Box = {
    minX: Math.min(tab.minX, t.box.minX),
    maxX: Math.max(tab.maxX, t.box.maxX),
    minY: Math.min(tab.minY, t.box.minY),
    maxY: tab.maxY,
  };
  return { tab, text: { ...t, vertical: false }, box };
}
