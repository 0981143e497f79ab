/**
 * The station table as cells of text, shared by the aligned text table and the
 * CSV: a heading row and one row per station, lengths written by `formatLength`.
 */
import { GirthError, formatLength, requireFinite } from '@girth/pipes';
import type { Template } from '@girth/unroll';
import type { StationTableOptions } from '../types.js';

/** Heading of the first fixed column: the 1-based station number. */
export const STATION_HEADING = 'Station';
/** Heading of the second fixed column: the station angle in degrees from the heel. */
export const ANGLE_HEADING = 'Angle (deg)';

/** Heading row and body rows of a station table. */
export interface StationCells {
  readonly headings: readonly string[];
  readonly rows: ReadonlyArray<readonly string[]>;
}

function requireList(value: unknown, field: string): readonly unknown[] {
  if (!Array.isArray(value)) throw new GirthError('BAD_JOB', field, `${field}: expected a list`, value);
  return value;
}

/** Checks the options once, so a bad option is reported before any row. */
export function checkTableOptions(options: StationTableOptions): void {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { format, fraction?, decimals? }', options);
  }
  const f = options.format;
  if (f !== 'ft-in' && f !== 'in' && f !== 'mm') {
    throw new GirthError('BAD_OPTION', 'options.format', `options.format: must be ft-in, in or mm, got ${String(f)}`, f);
  }
}

/** Fewest decimals (0 to 3) that write every angle exactly to 0.001°. */
function angleDecimals(anglesDeg: readonly number[]): number {
  for (let d = 0; d < 3; d++) {
    if (anglesDeg.every((a) => Math.abs(Number(a.toFixed(d)) - a) < 5e-4)) return d;
  }
  return 3;
}

/**
 * True when a station row has a value in a column. A row may leave a column out
 * where it has no value (e.g. the first element of a triangulated pattern has no
 * diagonal before it); a key that is present must hold a finite number.
 */
export function hasStationValue(row: Template['stations'][number], key: string): boolean {
  return row.values !== undefined && row.values !== null && Object.prototype.hasOwnProperty.call(row.values, key);
}

/** One length as the table writes it. */
export function tableLength(mm: unknown, options: StationTableOptions, field: string): string {
  return formatLength(requireFinite(mm, field), {
    format: options.format,
    ...(options.fraction === undefined ? {} : { fraction: options.fraction }),
    ...(options.decimals === undefined ? {} : { decimals: options.decimals }),
    field,
  });
}

/**
 * One station value as the table writes it, by the column's quantity: a length
 * in the table's format, an angle in degrees (never converted; to the column's
 * fixed `decimals` when it has them, e.g. 0.1° for weld preparation, else to
 * 0.001° with trailing zeros dropped), a count as a plain number (never converted).
 */
export function tableValue(
  value: unknown,
  quantity: Template['stationColumns'][number]['quantity'],
  options: StationTableOptions,
  field: string,
  decimals?: number,
): string {
  if (quantity === 'angle') {
    const deg = requireFinite(value, field);
    if (decimals !== undefined && Number.isInteger(decimals) && decimals >= 0 && decimals <= 6) {
      const text = deg.toFixed(decimals);
      return Number(text) === 0 ? (0).toFixed(decimals) : text; // never -0.0
    }
    return String(Math.round(deg * 1000) / 1000);
  }
  if (quantity === 'count') return String(requireFinite(value, field));
  return tableLength(value, options, field);
}

/**
 * Cells of the station table of a template.
 * @throws GirthError `BAD_OPTION` for an unknown format, fraction or decimals;
 *   `NOT_A_NUMBER` / `NOT_FINITE` naming the station and column of a missing
 *   or non-finite value, e.g. `template.stations[3].values.cutback`.
 */
export function stationCells(template: Template, options: StationTableOptions): StationCells {
  checkTableOptions(options);
  if (template === null || typeof template !== 'object') {
    throw new GirthError('BAD_JOB', 'template', `template: expected a template object, got ${String(template)}`, template);
  }
  const columns = requireList(template.stationColumns, 'template.stationColumns') as Template['stationColumns'];
  const stations = requireList(template.stations, 'template.stations') as Template['stations'];
  const angles = stations.map((s, i) => requireFinite(s.angleDeg, `template.stations[${i}].angleDeg`));
  const decimals = angleDecimals(angles);
  const rows = stations.map((s, i) => [
    String(requireFinite(s.n, `template.stations[${i}].n`)),
    angles[i]!.toFixed(decimals),
    ...columns.map((c) =>
      hasStationValue(s, c.key)
        ? tableValue(s.values[c.key], c.quantity, options, `template.stations[${i}].values.${c.key}`, c.decimals)
        : options.blank ?? '',
    ),
  ]);
  return { headings: [STATION_HEADING, ANGLE_HEADING, ...columns.map((c) => String(c.heading))], rows };
}
