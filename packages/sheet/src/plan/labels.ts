/**
 * The template's own labels (HEEL, TOE, TOP, ...): bold, centred on their point,
 * at the cap height the layout asked for.
 */
import type { TemplateLabel } from '@girth/unroll';
import { CAP_HEIGHT_EM } from '../style.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import { textLines } from '../internal/text-lines.js';

/**
 * Placements of the template's labels, template mm.
 *
 * @example planLabels([{ text: 'HEEL', at: [0, -8], heightMm: 4 }])[0].fontMm // 5.48 (4 / 0.73)
 */
export function planLabels(labels: readonly TemplateLabel[]): CentredText[] {
  return labels.map((l) => centredText(textLines(l.text), l.at, l.heightMm / CAP_HEIGHT_EM, true));
}
