/**
 * The one place the fit-up code reads and writes the values of a station row.
 * Rows keep their values (lengths in mm) in `values`.
 */
import type { StationRow } from '../../types.js';

/** The row's value in column `key` (mm for length columns), or undefined where the row leaves it out. */
export function stationValue(row: StationRow, key: string): number | undefined {
  return row.values[key];
}

/** All values of a row, keyed by column. */
export function stationValues(row: StationRow): Readonly<Record<string, number>> {
  return row.values;
}

/** The same row with its values replaced. */
export function withStationValues(row: StationRow, values: Readonly<Record<string, number>>): StationRow {
  return { ...row, values };
}
