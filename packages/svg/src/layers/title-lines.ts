/**
 * The lines of the title block: job and piece, what the template is, how it
 * goes on the pipe, and how to print it.
 */
import type { Template } from '@girth/unroll';
import type { ResolvedSvgOptions } from '../types.js';
import { FONT_MM } from '../style.js';
import { textLines } from '../internal/safe-text.js';
import { MM_PER_IN } from '../internal/numbers.js';
import { PRINT_NOTE } from '../print-note.js';

/** One line of the title block. */
export interface TitleLine {
  readonly text: string;
  readonly fontMm: number;
  readonly bold: boolean;
  /** Stable class of the line's `<text>`, e.g. `job`, `title`, `note`. */
  readonly role: string;
}

/** Blank left for writing by hand when no job or piece was given. */
const BLANK = '________________';

/**
 * A length for the title block in the sheet's units, e.g. `168.275 mm` or `6.625 in`.
 *
 * @example titleLength(168.275, 'in') // '6.625 in'
 */
export function titleLength(mm: number, units: 'mm' | 'in'): string {
  const v = units === 'in' ? mm / MM_PER_IN : mm;
  return `${Math.round(v * 1000) / 1000} ${units}`;
}

function oneLine(text: string): string {
  return textLines(text).join(' ');
}

/** How the template goes on the pipe or plate, in the fitter's words. */
function placementLine(template: Template, units: 'mm' | 'in'): string | undefined {
  if (template.kind === 'wrap' && template.wrapOdMm !== undefined && template.stretchOutMm !== undefined) {
    return (
      `Wrap on the ${titleLength(template.wrapOdMm, units)} OD: edge x = 0 on the heel line (station 1). ` +
      `Stretch-out ${titleLength(template.stretchOutMm, units)}.`
    );
  }
  if (template.kind === 'hole') {
    return template.wrapOdMm !== undefined
      ? `Lay on the ${titleLength(template.wrapOdMm, units)} OD of the pipe it is marked on.`
      : undefined;
  }
  if (template.kind === 'flat') return 'Flat pattern at true size: mark and cut from plate.';
  return undefined;
}

/**
 * The title block's lines for a template and options (user text cleaned to one line each).
 *
 * @example planTitleLines(template, resolveSvgOptions({ job: 'J-1' }))[0].text // 'Job: J-1 · Piece: ________________'
 */
export function planTitleLines(template: Template, options: ResolvedSvgOptions): TitleLine[] {
  const job = options.job === undefined ? BLANK : oneLine(options.job);
  const piece = options.piece === undefined ? BLANK : oneLine(options.piece);
  const lines: TitleLine[] = [
    { text: `Job: ${job} · Piece: ${piece}`, fontMm: FONT_MM.heading, bold: true, role: 'job' },
    { text: oneLine(template.title), fontMm: FONT_MM.title, bold: true, role: 'title' },
    ...template.notes.map((n) => ({ text: oneLine(n), fontMm: FONT_MM.body, bold: false, role: 'note' })),
  ];
  const placement = placementLine(template, options.sheetUnits);
  if (placement !== undefined) lines.push({ text: placement, fontMm: FONT_MM.body, bold: false, role: 'placement' });
  lines.push({
    text: `Template ${oneLine(template.id)} · sheet units ${options.sheetUnits} · ${PRINT_NOTE}`,
    fontMm: FONT_MM.body,
    bold: false,
    role: 'print',
  });
  return lines;
}
