/**
 * The square lines through the long and the short point of each cut, drawn
 * across a wrap when the template carries them (`withFitUp`): the short-point
 * line whenever the ordinates are measured from it, both (labelled) when the
 * user asked for both.
 */
import type { Point2, Template } from '@girth/unroll';
import { CAP_HEIGHT_EM } from '../style.js';
import { centredText, type CentredText } from '../internal/text-box.js';
import type { SheetPath } from '../types.js';

/** Square lines closer than this to the template's own square line are that line (not drawn twice), mm. */
const SAME_LINE_MM = 1e-6;

/** The reference lines and their labels, template mm. */
export interface ReferenceLinesPlan {
  readonly paths: readonly SheetPath[];
  readonly labels: readonly CentredText[];
}

/**
 * Lines and labels of the template's square lines. The short-point label sits
 * past its line on the pipe-body side; the long-point label past its line on
 * the pipe-end side, clear of the cut (which touches the long-point line).
 *
 * @example planReferenceLines(template).paths.length // 1: the short-point line of a plane cut measured from it
 */
export function planReferenceLines(template: Template): ReferenceLinesPlan {
  const o = template.ordinates;
  if (template.kind !== 'wrap' || o === undefined) return { paths: [], labels: [] };
  const squareY = template.squareLine.from[1];
  const paths: SheetPath[] = [];
  const labels: CentredText[] = [];
  for (const r of o.referenceLines) {
    const dir = r.shortPointLine.from[1] >= r.longPointLine.from[1] ? 1 : -1;
    const h = r.labels[0]?.heightMm ?? 5;
    const font = h / CAP_HEIGHT_EM;
    const quarter = (r.shortPointLine.from[0] + r.shortPointLine.to[0]) / 4;
    const label = (text: string, at: Point2): CentredText => centredText([text], at, font, true);
    paths.push({ kind: 'path', role: 'reference-line', layer: 'mark', part: r.shortPointLine });
    labels.push(label('SQUARE LINE, SHORT POINT', [quarter, r.shortPointLine.from[1] + dir * 1.5 * h]));
    if (o.bothLines) {
      const yLong = r.longPointLine.from[1];
      if (Math.abs(yLong - squareY) > SAME_LINE_MM) paths.push({ kind: 'path', role: 'reference-line', layer: 'mark', part: r.longPointLine });
      labels.push(label('SQUARE LINE, LONG POINT', [3 * quarter, yLong - dir * 2.5 * h]));
    }
  }
  return { paths, labels };
}
