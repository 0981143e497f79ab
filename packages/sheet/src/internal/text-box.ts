/**
 * Placing text by its middle: the baseline and the box a block of lines takes, in
 * template millimetres (y-up).
 */
import type { Point2 } from '@girth/unroll';
import { ASCENT_EM, CAP_HEIGHT_EM, DESCENT_EM, LINE_EM } from '../style.js';
import type { Box } from './box.js';
import { textWidthMm } from './text-metrics.js';

/** A block of text centred on a point: where its first baseline goes and the box it may cover. */
export interface CentredText {
  readonly lines: readonly string[];
  readonly fontMm: number;
  /** Middle of the first baseline, template mm (y-up). */
  readonly baseline: Point2;
  /** Everything the glyphs may cover, template mm. */
  readonly box: Box;
}

/**
 * Lines of text centred (both ways) on `centre`: the caps of the block sit
 * evenly around it.
 *
 * @param centre - template mm, y-up.
 * @param fontMm - font size, mm.
 * @param bold - true for bold type (wider).
 * @example centredText(['TOE'], [264, -10], 5.5, true).baseline // [264, -12.0075]
 */
export function centredText(lines: readonly string[], centre: Point2, fontMm: number, bold = false): CentredText {
  const cap = CAP_HEIGHT_EM * fontMm;
  const lineMm = LINE_EM * fontMm;
  const blockMm = cap + (lines.length - 1) * lineMm;
  const firstBaselineY = centre[1] + blockMm / 2 - cap;
  const lastBaselineY = firstBaselineY - (lines.length - 1) * lineMm;
  const halfW = Math.max(0, ...lines.map((l) => textWidthMm(l, fontMm, bold))) / 2;
  return {
    lines,
    fontMm,
    baseline: [centre[0], firstBaselineY],
    box: {
      minX: centre[0] - halfW,
      maxX: centre[0] + halfW,
      minY: lastBaselineY - DESCENT_EM * fontMm,
      maxY: firstBaselineY + ASCENT_EM * fontMm,
    },
  };
}
