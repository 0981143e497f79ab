/**
 * Options and vocabulary of the DXF exporter.
 */

/**
 * Which DXF to write. `AC1021` (AutoCAD 2007 format, LWPOLYLINE with bulges,
 * handles) suits current CAD and nesting software; `R12` (AC1009: POLYLINE /
 * VERTEX / SEQEND, no handles) suits older cutting-table controllers.
 */
export type DxfVersion = 'AC1021' | 'R12';

/** Unit of the coordinates written (and of `$INSUNITS`): millimetres or inches. */
export type DxfUnits = 'mm' | 'in';

/**
 * How the DXF carries text: `text` (TEXT entities on the TEXT layer), `none`
 * (left out, for a table that would choke on text), `stroke` (Girth's
 * single-stroke font as lines on MARK, for a table that etches or scribes it).
 */
export type DxfTextMode = 'text' | 'none' | 'stroke';

/**
 * How the DXF carries the sampled cut lines: `lines` (straight chords, as
 * sampled: every controller reads them) or `arcs` (fitted with circular arcs
 * within the arc tolerance: bulges of LWPOLYLINE in AC1021, of POLYLINE/VERTEX
 * in R12; a few smooth arcs instead of hundreds of chords).
 */
export type DxfCurveMode = 'lines' | 'arcs';

/** The three layers Girth writes, by role. */
export type DxfLayerRole = 'cut' | 'mark' | 'text';

/** A layer as written: name and AutoCAD Colour Index (1-255, never empty). */
export interface DxfLayer {
  readonly kind: 'dxf-layer';
  readonly role: DxfLayerRole;
  readonly name: string;
  /** AutoCAD Colour Index, 1-255. */
  readonly colorAci: number;
  /** What a cutting table should do with it. */
  readonly purpose: string;
}

/** Options of {@link templateToDxf}; every field is optional. */
export interface DxfOptions {
  /** Output unit; default `'mm'`. With `'in'` every coordinate is divided by 25.4 exactly. */
  readonly units?: DxfUnits;
  /** DXF version; default `'AC1021'`. */
  readonly version?: DxfVersion;
  /** Job name or number for the title text (any text; made ASCII-safe). */
  readonly job?: string;
  /** Piece or spool mark for the title text (any text; made ASCII-safe). */
  readonly piece?: string;
  /**
   * Cap height of the title line in mm, (0, 100]; default that of the sheet plan
   * (2.92 mm, as on the SVG). The rest of the title block scales with it.
   */
  readonly textHeightMm?: number;
  /** Write each station's number beside its station line; default true. */
  readonly stationNumbers?: boolean;
  /** Path ends closer than this (mm) are joined, (0, 1]; default {@link JOIN_EPS_MM}. */
  readonly joinEpsMm?: number;
  /**
   * Write the template as closed parts for a cutting table (see `closeTemplate` of
   * `@girth/unroll`): a wrap becomes one closed contour with a square end; default false.
   */
  readonly closedParts?: boolean;
  /** With `closedParts`: a single-cut wrap's stub length, mm, from the square line to the square end; default the deepest cutback + 50 mm. */
  readonly stubMm?: number;
  /** Develop on the OD (`'od'`, default) or on the mid-thickness of a rolled plate (`'mid'`, needs `plateThicknessMm`). */
  readonly surface?: 'od' | 'mid';
  /** Thickness of the plate rolled into the pipe, mm, for `surface: 'mid'`. */
  readonly plateThicknessMm?: number;
  /** Text as TEXT entities (`'text'`, default), left out (`'none`') or single-stroke lines on MARK (`'stroke'`). */
  readonly text?: DxfTextMode;
  /** Cut lines as sampled chords (`'lines'`, default) or fitted arcs (`'arcs'`); the sheet's notes say when arcs were fitted and how close. */
  readonly curves?: DxfCurveMode;
  /**
   * With `curves: 'arcs'`: the largest distance a fitted arc may stray from the exact cut, mm, (0, 1];
   * default `ARC_TOLERANCE_MM` (0.05 mm).
   */
  readonly arcToleranceMm?: number;
}

/** Options of {@link planToDxf}: how to write, not what (the plan already holds the text). */
export type DxfWriteOptions = Pick<DxfOptions, 'units' | 'version' | 'joinEpsMm' | 'text'>;
