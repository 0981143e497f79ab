/**
 * Both square lines of a cut, drawn across a wrap template.
 */
import type { Segment2, Template, TemplateLabel } from '../types.js';
import type { CutDepth } from './cut-depth.js';

/** Cap height of the reference-line labels, mm (as the wrap's own labels). */
export const REFERENCE_LINE_LABEL_HEIGHT_MM = 5;

/** The two square lines of one cut on a wrap, with their labels. */
export interface ReferenceLines {
  readonly kind: 'reference-lines';
  readonly templateId: string;
  readonly columnKey: string;
  /** Square line through the long point: y = `longLineYMm` of the depth, across the stretch-out. */
  readonly longPointLine: Segment2;
  /** Square line through the short point: the full depth further along the cutback. */
  readonly shortPointLine: Segment2;
  /** `SQUARE LINE, LONG POINT` and `SQUARE LINE, SHORT POINT`, each just beside its line on the pipe-body side. */
  readonly labels: readonly TemplateLabel[];
}

/**
 * The square lines through the long and the short point of each cut of a wrap
 * template, for drawing when the user asks for both. Lines span the template
 * from girth 0 to its stretch-out (from the square line's ends when the
 * template has no stretch-out). Templates without a matching depth give none.
 *
 * @example referenceLines(layout.templates[0], fitUp.cutDepths)[0]?.shortPointLine.from[1] // the full depth, mm
 */
export function referenceLines(template: Template, depths: readonly CutDepth[]): readonly ReferenceLines[] {
  if (template.kind !== 'wrap') return [];
  const x0 = template.squareLine.from[0];
  const x1 = template.stretchOutMm;
  const h = REFERENCE_LINE_LABEL_HEIGHT_MM;
  return depths
    .filter((d) => d.templateId === template.id && template.stationColumns.some((c) => c.key === d.columnKey))
    .map((d) => {
      const yLong = d.longLineYMm;
      const yShort = d.longLineYMm + d.cutbackDirection * d.fullDepthMm;
      const line = (y: number): Segment2 => ({ kind: 'segment', from: [x0, y], to: [x1, y] });
      // Labels sit a little toward the pipe body from each line, a quarter of the way across.
      const beside = (y: number): number => y + d.cutbackDirection * 1.5 * h;
      return {
        kind: 'reference-lines',
        templateId: d.templateId,
        columnKey: d.columnKey,
        longPointLine: line(yLong),
        shortPointLine: line(yShort),
        labels: [
          { text: 'SQUARE LINE, LONG POINT', at: [x0 + (x1 - x0) / 4, beside(yLong)], heightMm: h },
          { text: 'SQUARE LINE, SHORT POINT', at: [x0 + (x1 - x0) / 4, beside(yShort)], heightMm: h },
        ],
      };
    });
}
