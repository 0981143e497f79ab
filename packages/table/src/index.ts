/**
 * @girth/table: station (ordinate) tables as text and CSV, and `toResultJson`,
 * the JSON result contract (see docs/contract.md for its stable fields).
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/table
 */

export type {
  TableLengthFormat,
  StationTableOptions,
  StationTableTextOptions,
  ResultUnits,
  ResultJsonOptions,
  StationJson,
  TemplateJson,
  DevelopmentJson,
  PipeJson,
  WarningJson,
  ResultJson,
} from './types.js';
export { formatStationTable } from './format-station-table.js';
export { stationTableCsv } from './station-table-csv.js';
export { toResultJson, RESULT_DECIMALS } from './result-json.js';
