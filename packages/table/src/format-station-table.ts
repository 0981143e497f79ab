/**
 * The station table as aligned text, for the terminal and for printing.
 */
import { CAUTION, type Template } from '@girth/unroll';
import { stationCells, tableLength } from './internal/station-cells.js';
import type { StationTableTextOptions } from './types.js';

/** Spaces between columns. */
const GAP = '  ';

/** Text for one table line: no control characters (a heading cannot break the layout). */
const oneLine = (s: string): string => s.replace(/[\u0000-\u001F\u007F-\u009F\u2028\u2029]+/g, ' ');

/**
 * The station table of a template as aligned plain text.
 *
 * Layout: the template title, the stretch-out for wraps, a blank line, the
 * column headings (`Station`, `Angle (deg)`, then the template's station
 * columns), a rule, one right-aligned row per station, and (unless
 * `caution: false`) a blank line and the one-line `CAUTION` of `@girth/unroll`
 * (once; the template's notes are not printed). Lengths are written
 * by `formatLength` of `@girth/pipes`: feet-inch-sixteenths for `'ft-in'`
 * (1/8 or 1/32 with `fraction`), decimal inches or millimetres otherwise.
 * Angles get the fewest decimals (0 to 3) that show every station exactly.
 * Lines end in `\n`; the text ends with one.
 *
 * @param template a developed template (lengths in mm).
 * @param options `format` `'ft-in' | 'in' | 'mm'`, optional `fraction` 8/16/32,
 *   `decimals` 0-6 for in/mm, `caution` (default true).
 * @throws GirthError `BAD_OPTION` for an unknown format, fraction or decimals;
 *   `NOT_A_NUMBER` / `NOT_FINITE` naming a missing or non-finite station value.
 * @example
 * ```ts
 * // A plane cut at 22.5° on NPS 6 (OD 6.625 in), 16 stations:
 * formatStationTable(template, { format: 'ft-in' });
 * // Plane cut 22.5° on OD 6.625 in
 * // Stretch-out: 1'-8 13/16"
 * //
 * // Station  Angle (deg)        Girth  Cutback
 * // -------  -----------  -----------  -------
 * //       1          0.0           0"       0"
 * //       2         22.5      1 5/16"     1/8"
 * // ...
 * //       9        180.0     10 7/16"   2 3/4"
 * // ...
 * //
 * // CAUTION: verify against the actual pipe before cutting; ...
 * ```
 */
export function formatStationTable(template: Template, options: StationTableTextOptions): string {
  const { headings, rows } = stationCells(template, { blank: '-', ...options });
  const cells = [headings, ...rows].map((r) => r.map(oneLine));
  const widths = headings.map((_, c) => Math.max(...cells.map((r) => r[c]!.length)));
  const line = (r: readonly string[]): string => r.map((cell, c) => cell.padStart(widths[c]!)).join(GAP).trimEnd();
  const out: string[] = [oneLine(String(template.title ?? template.id))];
  if (template.kind === 'wrap') out.push(`Stretch-out: ${tableLength(template.stretchOutMm, options, 'template.stretchOutMm')}`);
  // With the fit-up applied: the square line the ordinates are measured from, the depth of the cut and the stock past the short point.
  for (const l of template.ordinates?.lines ?? []) out.push(oneLine(l));
  out.push('', line(cells[0]!), widths.map((w) => '-'.repeat(w)).join(GAP));
  for (const r of cells.slice(1)) out.push(line(r));
  if (options.caution ?? true) out.push('', CAUTION);
  return out.join('\n') + '\n';
}
