/**
 * The parts of the SVG document that describe rather than draw: `<title>`,
 * `<desc>` and `<metadata>` (job, piece, template id, stretch-out).
 */
import type { INode } from 'svgson';
import { CAUTION, type Template } from '@girth/unroll';
import type { ResolvedSvgOptions } from './types.js';
import { el, textNodes } from './internal/nodes.js';
import { textLines } from './internal/safe-text.js';

/** Namespace of Girth's own metadata element. */
export const GIRTH_SVG_NAMESPACE = 'urn:girth:svg:1';

const oneLine = (s: string): string => textLines(s).join(' ');

/** Round a length for metadata (0.001 mm). */
const mm3 = (v: number): string => String(Math.round(v * 1000) / 1000);

/**
 * `<title>`, `<desc>` and `<metadata>` for a sheet (user text cleaned to one line).
 *
 * @example describeSheet(template, resolveSvgOptions({ job: 'J-1' }))[0].name // 'title'
 */
export function describeSheet(template: Template, options: ResolvedSvgOptions): INode[] {
  const who = [options.job, options.piece].filter((s): s is string => s !== undefined).map(oneLine);
  const title = [...who, oneLine(template.title)].join(' — ');
  const desc = [...template.notes.map(oneLine), CAUTION].join('\n');
  return [
    el('title', {}, textNodes(title)),
    el('desc', {}, textNodes(desc)),
    el('metadata', {}, [
      el('girth:sheet', {
        'xmlns:girth': GIRTH_SVG_NAMESPACE,
        job: options.job,
        piece: options.piece,
        'template-id': template.id,
        'template-kind': template.kind,
        'stretch-out-mm': template.kind === 'wrap' ? mm3(template.stretchOutMm) : undefined,
        'wrap-od-mm': template.kind === 'flat' ? undefined : mm3(template.wrapOdMm),
        'overlap-mm': template.kind === 'wrap' ? mm3(options.overlapMm) : undefined,
        'sheet-units': options.sheetUnits,
      }),
    ]),
  ];
}
