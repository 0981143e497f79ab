/**
 * The lines of the title block: job and piece, what the template is, how it
 * goes on the pipe, and how to print it.
 */
import type { Template } from '@girth/unroll';
import { MM_PER_INCH } from '@girth/pipes';
import type { ResolvedSheetOptions } from '../types.js';
import { FONT_MM } from '../style.js';
import { textLines } from '../internal/text-lines.js';
import { PRINT_NOTE } from '../print-note.js';
import { wrapToWidth } from '../internal/wrap-width.js';

/** One line of the title block. */
export interface TitleLine {
  readonly text: string;
  readonly fontMm: number;
  readonly bold: boolean;
  /** Stable role of the line: `job`, `title`, `note`, `placement` or `print`. */
  readonly role: 'job' | 'title' | 'note' | 'placement' | 'print';
}


/** Blank left for writing by hand when no job or piece was given. */
const BLANK = '________________';

/**
 * A length for the title block in the sheet's units, e.g. `168.275 mm` or `6.625 in`.
 *
 * @example titleLength(168.275, 'in') // '6.625 in'
 */
export function titleLength(mm: number, units: 'mm' | 'in'): string {
  const v = units === 'in' ? mm / MM_PER_INCH : mm;
  return `${Math.round(v * 1000) / 1000} ${units}`;
}

function oneLine(text: string): string {
  return textLines(text).join(' ');
}

/**
 * How the template goes on the pipe or plate, in the fitter's words; one
 * sentence per kind, each handled on purpose.
 */
function placementLine(template: Template, units: 'mm' | 'in'): string {
  switch (template.kind) {
    case 'wrap':
      return (
        `Wrap on the ${titleLength(template.wrapOdMm, units)} OD: edge x = 0 on the ${oneLine(template.startLine)} line (station 1). ` +
        `Stretch-out ${titleLength(template.stretchOutMm, units)}.`
      );
    case 'hole':
      return template.placement ?? `Lay on the ${titleLength(template.wrapOdMm, units)} OD of the pipe it is marked on.`;
    case 'flat':
      return 'Flat pattern at true size: mark and cut from plate.';
  }
}

/**
 * The title block's lines for a template and options (user text cleaned to one
 * line each), each broken at spaces into lines no wider than `widthMm`.
 *
 * @param widthMm - the width the lines may take, mm (the drawing's width, or the sheet's least width).
 * @example planTitleLines(template, resolveSheetOptions({ job: 'J-1' }), 180)[0].text // 'Job: J-1 · Piece: ________________'
 */
export function planTitleLines(template: Template, options: ResolvedSheetOptions, widthMm: number): TitleLine[] {
  const job = options.job === undefined ? BLANK : oneLine(options.job);
  const piece = options.piece === undefined ? BLANK : oneLine(options.piece);
  const k = options.textScale;
  const lines: TitleLine[] = [
    { text: `Job: ${job} · Piece: ${piece}`, fontMm: FONT_MM.heading * k, bold: true, role: 'job' },
    { text: oneLine(template.title), fontMm: FONT_MM.title * k, bold: true, role: 'title' },
    ...template.notes.map((n) => ({ text: oneLine(n), fontMm: FONT_MM.body * k, bold: false, role: 'note' as const })),
  ];
  lines.push({ text: placementLine(template, options.sheetUnits), fontMm: FONT_MM.body * k, bold: false, role: 'placement' });
  lines.push({
    text: `Template ${oneLine(template.id)} · sheet units ${options.sheetUnits} · ${PRINT_NOTE}`,
    fontMm: FONT_MM.body * k,
    bold: false,
    role: 'print',
  });
  // Every line is broken to the width, so the drawing, not a long note, sets the sheet's width (a blank line stays one).
  return lines.flatMap((l) => {
    const parts = wrapToWidth(l.text, widthMm, l.fontMm, l.bold);
    return parts.length <= 1 ? [l] : parts.map((text) => ({ ...l, text }));
  });
}
