/**
 * The title block under the drawing: job and piece, title and notes, how the
 * template goes on, how to print, beside the calibration L (one arm across,
 * one up, each measured on the print), then the caution. Laid out here
 * relative to the block's top left corner (down the page, mm); `planSheet`
 * places it under the drawing.
 */
import { CAUTION } from '@girth/unroll';
import type { SheetUnits } from '../types.js';
import { ASCENT_EM, CALIBRATION, CAP_HEIGHT_EM, DESCENT_EM, FONT_MM, LINE_EM, TEXT_INSET_EM } from '../style.js';
import { textWidthMm } from '../internal/text-metrics.js';
import { wrapToWidth } from '../internal/wrap-width.js';
import type { TitleLine } from './title-lines.js';

/** Gap between the rule and the first line, and around the calibration row, mm. */
const ROW_GAP_MM = 2;
/** Weight of the rule over the title block, mm. */
export const RULE_MM = 0.25;
/** Gap between the calibration L and the text beside it, mm. */
const CAPTION_GAP_MM = 4;

/** A bar of the calibration L, paper mm (y-down) from the block's top left. */
export interface CalibrationBar {
  readonly xMm: number;
  readonly topMm: number;
  readonly widthMm: number;
  readonly heightMm: number;
}

/** Where each piece of the title block goes, paper mm (y-down) from its top left. */
export interface TitleBlockPlan {
  /** Lines, each with its left end and baseline. */
  readonly lines: readonly (TitleLine & { readonly xMm: number; readonly baselineMm: number })[];
  /** The calibration L: the bar across and the bar up, sharing the outer corner at the bottom left. */
  readonly bars: readonly [CalibrationBar, CalibrationBar];
  readonly barCaption: { readonly lines: readonly string[]; readonly xMm: number; readonly baselineMm: number; readonly fontMm: number };
  readonly caution: { readonly lines: readonly string[]; readonly baselineMm: number; readonly fontMm: number };
  readonly widthMm: number;
  readonly heightMm: number;
}

/**
 * The width title lines may take beside the calibration L's upright arm, mm,
 * in a block `widthMm` wide.
 *
 * @example titleTextWidthMm(180) // 173.5
 */
export function titleTextWidthMm(widthMm: number): number {
  return widthMm - CALIBRATION.heightMm - CAPTION_GAP_MM;
}

/**
 * Lays out the title block `widthMm` wide, relative to its top left corner
 * (paper mm). Title lines go beside the L's upright arm (break them to
 * {@link titleTextWidthMm} first); the caption and the caution are broken to fit here.
 *
 * @example planTitleBlock(lines, 'mm', 1, 180).bars[0].widthMm // 100
 */
export function planTitleBlock(titleLines: readonly TitleLine[], units: SheetUnits, textScale: number, widthMm: number): TitleBlockPlan {
  const lengthMm = CALIBRATION.lengthMm[units];
  const barMm = CALIBRATION.heightMm;
  const textX = barMm + CAPTION_GAP_MM;
  let cursor = ROW_GAP_MM;
  let usedW = 0;
  const lines = titleLines.map((line) => {
    const baselineMm = cursor + ASCENT_EM * line.fontMm;
    cursor += LINE_EM * line.fontMm;
    const xMm = textX + TEXT_INSET_EM * line.fontMm;
    usedW = Math.max(usedW, xMm + textWidthMm(line.text, line.fontMm, line.bold));
    return { ...line, xMm, baselineMm };
  });
  // The L: the upright arm from the block's top down beside the lines (longer text pushes it down),
  // the arm across along its foot.
  const footMm = Math.max(ROW_GAP_MM + lengthMm, cursor + ROW_GAP_MM + barMm);
  const up: CalibrationBar = { xMm: 0, topMm: footMm - lengthMm, widthMm: barMm, heightMm: lengthMm };
  const across: CalibrationBar = { xMm: 0, topMm: footMm - barMm, widthMm: lengthMm, heightMm: barMm };
  const captionFont = FONT_MM.calibration * textScale;
  const caption = CALIBRATION.caption[units];
  const captionX = lengthMm + CAPTION_GAP_MM + TEXT_INSET_EM * captionFont;
  const captionLines = wrapToWidth(`Calibration: each arm of this L must measure ${caption} on the print, across and up.`, Math.max(widthMm - captionX, 10 * captionFont), captionFont);
  // The caption's first line is centred on the arm across, further lines run down below it.
  const captionBaseline = across.topMm + barMm / 2 + (CAP_HEIGHT_EM * captionFont) / 2;
  const barCaption = { lines: captionLines, xMm: captionX, baselineMm: captionBaseline, fontMm: captionFont };
  for (const l of captionLines) usedW = Math.max(usedW, captionX + textWidthMm(l, captionFont));
  cursor = Math.max(footMm, captionBaseline + (captionLines.length - 1) * LINE_EM * captionFont + DESCENT_EM * captionFont) + ROW_GAP_MM;
  const cautionFont = FONT_MM.caution * textScale;
  const cautionLines = wrapToWidth(CAUTION, widthMm - TEXT_INSET_EM * cautionFont, cautionFont, true);
  const caution = { lines: cautionLines, baselineMm: cursor + ASCENT_EM * cautionFont, fontMm: cautionFont };
  for (const l of cautionLines) usedW = Math.max(usedW, TEXT_INSET_EM * cautionFont + textWidthMm(l, cautionFont, true));
  cursor += LINE_EM * cautionFont * cautionLines.length;
  return { lines, bars: [across, up], barCaption, caution, widthMm: Math.max(widthMm, usedW, lengthMm), heightMm: cursor };
}
