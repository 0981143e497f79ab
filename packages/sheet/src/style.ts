/**
 * The look of a sheet: line weights, greys, text sizes and spacing, all in mm
 * on the paper. Black and grey only, so any printer gives the same result.
 */

/** Line weights on paper, mm. The cut line is the heaviest; marks and hatching the lightest. */
export const STROKE_MM = {
  /** The line to cut on. */
  cut: 0.6,
  /** The square line, the reference square to the pipe axis. */
  squareLine: 0.35,
  /** Station lines. */
  stations: 0.2,
  /** Centre lines, top line, seam. */
  marks: 0.2,
  /** Outline of the glue tab. */
  overlapOutline: 0.25,
  /** Hatching of the glue tab. */
  overlapHatch: 0.15,
  /** The line on the tab where station 1 goes. */
  overlapAlign: 0.35,
} as const;

/** The widest line drawn, mm: half of it is kept clear of the paper's edge. */
export const MAX_STROKE_MM = Math.max(...Object.values(STROKE_MM));

/** Colours: black for what is cut or read, greys for helpers. */
export const INK = {
  black: '#000000',
  dark: '#404040',
  mid: '#707070',
  light: '#a0a0a0',
} as const;

/** Dash patterns, mm on paper. */
export const DASH_MM = {
  marks: [3, 1, 0.5, 1],
  overlapAlign: [4, 2],
} as const;

/** Fonts named in the SVG, widest first (the width estimate is made for DejaVu Sans). */
export const FONT_FAMILY = 'DejaVu Sans, Verdana, Arial, Helvetica, sans-serif';

/** Text sizes (font size, em), mm. */
export const FONT_MM = {
  heading: 4.5,
  title: 4,
  body: 3,
  caution: 2.8,
  /** Cap height 3.07 mm: at least {@link MIN_CAP_MM}. */
  stationNumber: 4.2,
  overlap: 3,
  calibration: 3,
} as const;

/** Smallest cap height of any text on the drawing (station numbers, labels), mm: legible at the pipe. */
export const MIN_CAP_MM = 3;
/** Cap height of the sans fonts named, as a fraction of the font size (DejaVu Sans 0.73, Arial 0.72). */
export const CAP_HEIGHT_EM = 0.73;
/** Ascent above the baseline allowed for any glyph, em. */
export const ASCENT_EM = 0.95;
/** Descent below the baseline allowed for any glyph, em. */
export const DESCENT_EM = 0.3;
/**
 * Left-aligned text starts this far in from its edge, em: some glyphs (a bold J)
 * reach left of their origin.
 */
export const TEXT_INSET_EM = 0.1;
/** Distance between baselines, em. */
export const LINE_EM = 1.35;

/**
 * Least width of a sheet's content (title block), mm at text scale 1: room for the
 * calibration L and its caption; fits across Letter or A4 held upright.
 */
export const MIN_SHEET_WIDTH_MM = 180;
/** Gap between the drawing and the title block, mm. */
export const TITLE_GAP_MM = 8;
/** Gap between a station line's end and its number, mm. */
export const STATION_NUMBER_GAP_MM = 1.5;

/** The calibration bar: its height, mm, and its length per sheet unit (100 mm, or 4 in). */
export const CALIBRATION = {
  heightMm: 2.5,
  lengthMm: { mm: 100, in: 4 * 25.4 },
  caption: { mm: '100 mm', in: '4 in' },
} as const;

/** Spacing of the hatching on the glue tab, mm. */
export const HATCH_SPACING_MM = 4;
