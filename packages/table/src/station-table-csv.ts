/**
 * The station table as CSV, for spreadsheets and other programs.
 */
import type { Template } from '@girth/unroll';
import { csvField, csvRecords, csvTextField } from './internal/csv.js';
import { stationCells } from './internal/station-cells.js';
import type { StationTableOptions } from './types.js';

/**
 * The station table of a template as CSV (RFC 4180): a header row
 * (`Station`, `Angle (deg)`, then the template's column headings) and one
 * record per station, lengths written as in {@link formatStationTable}
 * (`2'-1 11/16"` becomes `"2'-1 11/16"""`). Fields holding a comma, double quote,
 * CR or LF are quoted with inner quotes doubled; a heading that would start a
 * spreadsheet formula (`=`, `+`, `-`, `@`) is prefixed with `'`. Records end in
 * CR LF. No title or caution rows: the file is data; print the text table for
 * the shop.
 *
 * @param template a developed template (lengths in mm).
 * @param options `format` `'ft-in' | 'in' | 'mm'`, optional `fraction`, `decimals`.
 * @throws GirthError as {@link formatStationTable}.
 * @example
 * ```ts
 * // A plane cut at 22.5° on NPS 6 (OD 6.625 in):
 * stationTableCsv(template, { format: 'ft-in' });
 * // 'Station,Angle (deg),Girth,Cutback\r\n1,0.0,"0""","0"""\r\n2,22.5,"1 5/16""","1/8"""\r\n...'
 * ```
 */
export function stationTableCsv(template: Template, options: StationTableOptions): string {
  const { headings, rows } = stationCells(template, options);
  return csvRecords([headings.map(csvTextField), ...rows.map((r) => r.map(csvField))]);
}
