/**
 * The parts of the SVG document that describe rather than draw: `<title>`,
 * `<desc>` and `<metadata>` (job, piece, template id, stretch-out).
 */
import { CAUTION } from '@girth/unroll';
import type { SheetPlan } from '@girth/sheet';
import { el, textData } from './internal/xml.js';
import { textLines } from './internal/safe-text.js';

/** Namespace of Girth's own metadata element. */
export const GIRTH_SVG_NAMESPACE = 'urn:girth:svg:1';

const oneLine = (s: string): string => textLines(s).join(' ');

/** Round a length for metadata (0.001 mm). */
const mm3 = (v: number): string => String(Math.round(v * 1000) / 1000);

/**
 * `<title>`, `<desc>` and `<metadata>` for a sheet (user text cleaned to one line).
 *
 * @example describeSheet(planSheet(template, { job: 'J-1' }))[0] // '<title>J-1 — …</title>'
 */
export function describeSheet(plan: SheetPlan): string[] {
  const t = plan.template;
  const who = [plan.job, plan.piece].filter((s): s is string => s !== undefined).map(oneLine);
  const title = [...who, oneLine(t.title)].join(' — ');
  const desc = [...t.notes.map(oneLine), CAUTION].join('\n');
  return [
    el('title', {}, [textData(title)]),
    el('desc', {}, [textData(desc)]),
    el('metadata', {}, [
      el('girth:sheet', {
        'xmlns:girth': GIRTH_SVG_NAMESPACE,
        job: plan.job,
        piece: plan.piece,
        'template-id': t.id,
        'template-kind': t.kind,
        'stretch-out-mm': t.stretchOutMm === undefined ? undefined : mm3(t.stretchOutMm),
        'wrap-od-mm': t.wrapOdMm === undefined ? undefined : mm3(t.wrapOdMm),
        'overlap-mm': t.kind === 'wrap' ? mm3(plan.overlapMm) : undefined,
        'sheet-units': plan.units,
      }),
    ]),
  ];
}
