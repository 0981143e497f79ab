/**
 * The title block under the drawing: job and piece, title and notes, how the
 * template goes on, how to print; then the calibration bar and the caution.
 */
import type { INode } from 'svgson';
import { CAUTION } from '@girth/unroll';
import type { SheetUnits } from '../types.js';
import { ASCENT_EM, CALIBRATION, CAP_HEIGHT_EM, DESCENT_EM, FONT_FAMILY, FONT_MM, INK, LINE_EM, TEXT_INSET_EM } from '../style.js';
import { el, textElement } from '../internal/nodes.js';
import type { NumberWriter } from '../internal/numbers.js';
import { paperLinesData } from '../internal/path-data.js';
import { textWidthMm } from '../internal/text-metrics.js';
import type { TitleLine } from './title-lines.js';

/** Gap between the rule and the first line, and around the calibration row, mm. */
const ROW_GAP_MM = 2;
/** Weight of the rule over the title block, mm. */
const RULE_MM = 0.25;
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
export function planTitleBlock(titleLines: readonly TitleLine[], units: SheetUnits): TitleBlockPlan {
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
  const captionFont = FONT_MM.calibration;
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
  const cautionFont = FONT_MM.caution;
  const caution = { text: CAUTION, baselineMm: cursor + ASCENT_EM * cautionFont, fontMm: cautionFont };
  widthMm = Math.max(widthMm, TEXT_INSET_EM * cautionFont + textWidthMm(CAUTION, cautionFont, true));
  cursor += LINE_EM * cautionFont;
  return { lines, bar: { topMm: barTop, lengthMm, heightMm }, barCaption, caution, widthMm, heightMm: cursor };
}

/**
 * The `title-block` group (text and a rule above it) at paper (`left`, `top`), with the
 * rule `ruleMm` long.
 */
export function titleBlockGroup(plan: TitleBlockPlan, left: number, top: number, ruleMm: number, w: NumberWriter): INode {
  const text = (t: string, baselineMm: number, fontMm: number, attrs: Record<string, string | undefined>) =>
    textElement(
      t,
      { x: w.len(left + TEXT_INSET_EM * fontMm), y: w.len(top + baselineMm), 'font-size': w.len(fontMm), ...attrs },
      w.len(LINE_EM * fontMm),
    );
  return el('g', { id: 'title-block', class: 'title-block', fill: INK.black, stroke: 'none', 'font-family': FONT_FAMILY }, [
    el('path', {
      class: 'title-rule',
      // Inset by half its weight so even a renderer that pads every stroke on all sides stays inside.
      d: paperLinesData([[[left + RULE_MM / 2, top], [left + ruleMm - RULE_MM / 2, top]]], w),
      fill: 'none',
      stroke: INK.mid,
      'stroke-width': w.len(RULE_MM),
    }),
    ...plan.lines.map((l) =>
      text(l.text, l.baselineMm, l.fontMm, { class: `title-${l.role}`, 'font-weight': l.bold ? 'bold' : undefined }),
    ),
    text(plan.caution.text, plan.caution.baselineMm, plan.caution.fontMm, { class: 'caution', 'font-weight': 'bold' }),
  ]);
}

/** The `calibration` group: a solid bar of exactly 100 mm (or 4 in) and its caption. */
export function calibrationGroup(plan: TitleBlockPlan, left: number, top: number, w: NumberWriter): INode {
  const c = plan.barCaption;
  return el('g', { id: 'calibration', class: 'calibration' }, [
    el('rect', {
      class: 'calibration-bar',
      x: w.len(left),
      y: w.len(top + plan.bar.topMm),
      width: w.len(plan.bar.lengthMm),
      height: w.len(plan.bar.heightMm),
      fill: INK.black,
      stroke: 'none',
    }),
    textElement(
      c.text,
      { class: 'calibration-caption', x: w.len(left + c.xMm), y: w.len(top + c.baselineMm), 'font-size': w.len(c.fontMm), 'font-family': FONT_FAMILY, fill: INK.black },
      w.len(LINE_EM * c.fontMm),
    ),
  ]);
}
