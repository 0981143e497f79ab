/**
 * Options and shapes of the station tables and of the JSON result contract.
 */

/** How lengths are written in a station table: decimal mm, decimal inches, or feet-inch-fractions. */
export type TableLengthFormat = 'ft-in' | 'in' | 'mm';

/** Options of {@link formatStationTable} and {@link stationTableCsv}. */
export interface StationTableOptions {
  /** `'ft-in'` (`2'-1 11/16"`), `'in'` (`25.688"`) or `'mm'` (`652.5 mm`). */
  readonly format: TableLengthFormat;
  /** For `'ft-in'`: round to 1/8, 1/16 (default) or 1/32 inch. */
  readonly fraction?: 8 | 16 | 32;
  /** For `'in'` and `'mm'`: digits after the point, 0 to 6 (default 3 for in, 1 for mm). */
  readonly decimals?: number;
  /** Text of a cell where a station has no value in a column (default empty). */
  readonly blank?: string;
}

/** Options of {@link formatStationTable} only. */
export interface StationTableTextOptions extends StationTableOptions {
  /** End the table with the one-line caution; default true. */
  readonly caution?: boolean;
}

/** Unit of every contract length in a {@link ResultJson}: decimal inches or millimetres. */
export type ResultUnits = 'in' | 'mm';

/** Options of {@link toResultJson}. */
export interface ResultJsonOptions {
  /** Unit of every contract length, the joint's own fields included. */
  readonly units: ResultUnits;
}

/** One station of a template in the JSON contract: `n`, `angleDeg`, then one number per station column (`girth`, `cutback`, `axial`, ...). */
export interface StationJson {
  readonly n: number;
  readonly angleDeg: number;
  readonly [column: string]: number;
}

/** One template in the JSON contract. */
export interface TemplateJson {
  /** Contract id, e.g. `branch-cut`, `header-hole`. */
  readonly id: string;
  /** The template's one-line title. */
  readonly title: string;
  /** For wraps: developed length of the girth, in the result's unit. */
  readonly stretchOut?: number;
  /**
   * Present when the template was developed on a chosen surface: `surface`
   * `od` or `mid` (mid-thickness of a rolled plate), the `diameter` the girth
   * is measured on (OD, or OD - plate thickness), the pipe's `od`, the
   * `plateThickness` for `mid`, all in the result's unit, and `rule` in words.
   */
  readonly development?: DevelopmentJson;
  /** Present when the template was made into one closed part to cut: `stub` (single-cut wraps), in the result's unit. */
  readonly closedPart?: { readonly stub?: number };
  readonly stations: readonly StationJson[];
  /** With the fit-up applied, on a template with a cut measured from a square line: the reference and each cut column's depth (see docs/contract.md). */
  readonly ordinates?: unknown;
}

/** How a template's girth was developed (see {@link TemplateJson.development}). */
export interface DevelopmentJson {
  readonly surface: 'od' | 'mid';
  readonly diameter: number;
  readonly od: number;
  readonly plateThickness?: number;
  readonly rule: string;
}

/** A pipe as the joint used it, lengths in the result's unit. */
export interface PipeJson {
  readonly role: string;
  readonly label: string;
  readonly od: number;
  readonly wall: number;
  readonly id: number;
}

/** A warning as in the result. */
export interface WarningJson {
  readonly code: string;
  readonly message: string;
  readonly field?: string;
}

/**
 * The JSON result contract (DESIGN.md, "The result contract"): the library's
 * and the CLI's `--json` output. Key names are fixed; fields may be added,
 * never renamed.
 */
export interface ResultJson {
  readonly kind: string;
  readonly units: ResultUnits;
  readonly templates: readonly TemplateJson[];
  readonly warnings: readonly WarningJson[];
  readonly pipes: readonly PipeJson[];
  /** The joint's own fields by `kind` (see `toResultJson`), lengths in `units`. */
  readonly [jointField: string]: unknown;
}
