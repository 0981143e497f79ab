/**
 * The title block under the drawing: job and piece, title and notes, how the
 * template goes on, how to print; then the calibration bar and the caution.
 * Laid out here relative to the block's top left corner (down the page, mm);
 * `planSheet` places it under the drawing.
 */
import { CAUTION } from '@girth/unroll';
import type { SheetUnits } from '../types.js';
import { ASCENT_EM, CALIBRATION, CAP_HEIGHT_EM, DESCENT_EM, FONT_MM, LINE_EM, TEXT_INSET_EM } from '../style.js';
import { textWidthMm } from '../internal/text-metrics.js';
import type { TitleLine } from './title-lines.js';

/** Gap between the rule and the first line, and around the calibration row, mm. */
const ROW_GAP_MM = 2;
/** Weight of the rule over the title block, mm. */
export const RULE_MM = 0.25;
/** Gap between the calibration bar and its caption, mm. */
const CAPTION_GAP_MM = 4;

/** Where each piece of the title block goes, paper mm (y-down) from its top left. */
export interface TitleBlockPlan {
  readonly lines: readonly (TitleLine & { readonly baselineMm: number })[];
  readonly bar: { readonly topMm: number; readonly lengthMm: number; readonly heightMm: number };
  readonly barCaption: { readonly text: string; readonly xMm: number; readonly baselineMm: number; readonly fontMm: number };
  readonly caution: { readonly text: string; readonly baselineMm: number; readonly fontMm: number };
  readonly widthMm: number;
  readonly heightMm: number;
}

/**
 * Lays out the title block, relative to its top left corner (paper mm).
 *
 * @example planTitleBlock(lines, 'mm').bar.lengthMm // 100
 */
export function planTitleBlock(titleLines: readonly TitleLine[], units: SheetUnits, textScale = 1): TitleBlockPlan {
  let cursor = ROW_GAP_MM;
  let widthMm = 0;
  const lines = titleLines.map((line) => {
    const baselineMm = cursor + ASCENT_EM * line.fontMm;
    cursor += LINE_EM * line.fontMm;
    widthMm = Math.max(widthMm, (TEXT_INSET_EM * line.fontMm) + textWidthMm(line.text, line.fontMm, line.bold));
    return { ...line, baselineMm };
  });
  cursor += ROW_GAP_MM;
  const lengthMm = CALIBRATION.lengthMm[units];
  const heightMm = CALIBRATION.heightMm;
  const captionFont = FONT_MM.calibration * textScale;
  const caption = CALIBRATION.caption[units];
  const captionText = `${caption}: this bar must measure ${caption} on the print`;
  const rowMm = Math.max(heightMm, (ASCENT_EM + DESCENT_EM) * captionFont);
  const barTop = cursor + (rowMm - heightMm) / 2;
  const barCaption = {
    text: captionText,
    xMm: lengthMm + CAPTION_GAP_MM + TEXT_INSET_EM * captionFont,
    baselineMm: barTop + heightMm / 2 + (CAP_HEIGHT_EM * captionFont) / 2,
    fontMm: captionFont,
  };
  widthMm = Math.max(widthMm, barCaption.xMm + textWidthMm(captionText, captionFont));
  cursor += rowMm + ROW_GAP_MM;
  const cautionFont = FONT_MM.caution * textScale;
  const caution = { text: CAUTION, baselineMm: cursor + ASCENT_EM * cautionFont, fontMm: cautionFont };
  widthMm = Math.max(widthMm, TEXT_INSET_EM * cautionFont + textWidthMm(CAUTION, cautionFont, true));
  cursor += LINE_EM * cautionFont;
  return { lines, bar: { topMm: barTop, lengthMm, heightMm }, barCaption, caution, widthMm, heightMm: cursor };
}

