/**
 * The fit-up block: under the drawing, above the title block, the square line
 * the ordinates are measured from (with the depth of the cut and the stock
 * past the short point) and the joint's fit-up dimensions, as the template
 * carries them (`withFitUp`, worded in the job's unit).
 */
import type { Point2, Template } from '@girth/unroll';
import { ASCENT_EM, CAP_HEIGHT_EM, DESCENT_EM, FONT_MM, LINE_EM, MIN_SHEET_WIDTH_MM, TEXT_INSET_EM, TITLE_GAP_MM } from '../style.js';
import type { Box } from '../internal/box.js';
import { textLines } from '../internal/text-lines.js';
import { textWidthMm } from '../internal/text-metrics.js';
import { wrapToWidth } from '../internal/wrap-width.js';
import type { SheetText } from '../types.js';

/** The block placed: its lines and the box they cover, template mm. */
export interface FitUpBlockPlan {
  readonly texts: readonly SheetText[];
  /** Empty (min > max) when the template has no fit-up. */
  readonly box: Box;
}

function line(text: string, x: number, y: number, fontMm: number, bold: boolean): SheetText {
  const at: Point2 = [x, y];
  return {
    kind: 'text',
    role: 'fit-up',
    layer: 'text',
    lines: [text],
    at,
    anchor: 'start',
    fontMm,
    capHeightMm: CAP_HEIGHT_EM * fontMm,
    lineMm: LINE_EM * fontMm,
    bold,
    rotateDeg: 0,
    pivot: at,
    box: { minX: x, maxX: x + textWidthMm(text, fontMm, bold), minY: y - DESCENT_EM * fontMm, maxY: y + ASCENT_EM * fontMm },
  };
}

/**
 * The fit-up block of a template, flush left under `drawing`: a bold
 * `FIT-UP` heading, then each line (cleaned to one line, broken at spaces to
 * the drawing's width, as the title block's, at least `MIN_SHEET_WIDTH_MM`).
 *
 * @param drawing - what is drawn so far, template mm.
 * @param textScale - the title block's text scale.
 * @example planFitUpBlock(template, drawing, 1).texts[0]?.lines // ['FIT-UP']
 */
export function planFitUpBlock(template: Template, drawing: Box, textScale: number): FitUpBlockPlan {
  const words = [...(template.ordinates?.lines ?? []), ...(template.fitUpLines ?? [])].map((l) => textLines(l).join(' '));
  if (words.length === 0) return { texts: [], box: { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity } };
  const fontMm = FONT_MM.body * textScale;
  const x = drawing.minX + TEXT_INSET_EM * fontMm;
  let y = drawing.minY - TITLE_GAP_MM - ASCENT_EM * fontMm;
  const widthMm = Math.max(drawing.maxX - drawing.minX, MIN_SHEET_WIDTH_MM) - 2 * TEXT_INSET_EM * fontMm;
  const texts: SheetText[] = [line('FIT-UP', x, y, fontMm, true)];
  for (const w of words) {
    for (const part of wrapToWidth(w, widthMm, fontMm)) {
      y -= LINE_EM * fontMm;
      texts.push(line(part, x, y, fontMm, false));
    }
  }
  let box = texts[0]!.box;
  for (const t of texts) box = { minX: Math.min(box.minX, t.box.minX), minY: Math.min(box.minY, t.box.minY), maxX: Math.max(box.maxX, t.box.maxX), maxY: Math.max(box.maxY, t.box.maxY) };
  return { texts, box };
}
