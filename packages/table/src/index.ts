export * from './types.js';
export * from './format-station-table.js';
export * from './station-table-csv.js';
export * from './result-json.js';
