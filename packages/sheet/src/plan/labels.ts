/**
 * The template's own labels (HEEL, TOE, TOP LINE, SEAM, ...): bold, at the cap
 * height the layout asked for (never under `MIN_CAP_MM`), centred on the point
 * the layout suggested or, when that spot is taken, on the nearest free spot
 * around it, clear of the cut, the square line and other text.
 */
import type { TemplateLabel } from '@girth/unroll';
import { CAP_HEIGHT_EM, MIN_CAP_MM } from '../style.js';
import type { CentredText } from '../internal/text-box.js';
import { textLines } from '../internal/text-lines.js';
import type { Obstacles } from './obstacles.js';
import { placeText, ringsAround } from './place-text.js';

/** Rings around a label's point are this many cap heights apart. */
const RING_STEP_CAPS = 0.5;
/** And reach this many cap heights out; past that the label is set on its own point regardless. */
const RING_REACH_CAPS = 12;

/**
 * Placements of the template's labels, template mm, each registered in `obstacles`.
 *
 * @example planLabels([{ text: 'HEEL', at: [0, -8], heightMm: 4 }], obstacles)[0].fontMm // 5.48 (4 / 0.73)
 */
export function planLabels(labels: readonly TemplateLabel[], obstacles: Obstacles): CentredText[] {
  const out: CentredText[] = [];
  for (const l of labels) {
    const capMm = Math.max(l.heightMm, MIN_CAP_MM);
    const fontMm = capMm / CAP_HEIGHT_EM;
    const lines = textLines(l.text);
    const placed =
      placeText(obstacles, lines, fontMm, true, ringsAround(l.at, RING_STEP_CAPS * capMm, RING_REACH_CAPS * capMm)) ??
      placeText(obstacles, lines, fontMm, true, [l.at], true);
    if (placed) out.push(placed);
  }
  return out;
}
