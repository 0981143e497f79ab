/**
 * The sheet plan: everything a writer puts on the sheet of one template, placed
 * once, as plain readonly data.
 *
 * Coordinates are the template's own: millimetres, x to the right, **y up**
 * (like DXF and like `@girth/unroll`). The SVG writer flips y onto the paper;
 * the DXF writer writes them as they are (divided by 25.4 for inches).
 */
import type { PathPart, Point2, TemplateKind } from '@girth/unroll';

/** Units of the sheet: lengths written in the title block and, for SVG, the user unit. */
export type SheetUnits = 'mm' | 'in';

/** An axis-aligned box, mm (y-up). Empty when `minX > maxX`. */
export interface Box {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/**
 * Which layer an item is on: `cut` (lines to cut), `mark` (lines to mark or
 * scribe), `text` (words and numbers for people), `paper` (only on a printed
 * sheet: glue tab, calibration bar and its caption, the rule over the title
 * block; a DXF leaves these out).
 */
export type SheetLayer = 'cut' | 'mark' | 'text' | 'paper';

/** What a drawn line is for. */
export type SheetPathRole =
  | 'cut'
  | 'square-line'
  | 'station-line'
  | 'mark'
  | 'overlap-hatch'
  | 'overlap-align'
  | 'title-rule'
  /** A square line through the long or the short point of a cut (`withFitUp`). */
  | 'reference-line'
  /** The stretch of a station measured from the short-point line to the cut. */
  | 'ordinate-line';

/** What a piece of text is for. */
export type SheetTextRole =
  | 'station-number'
  | 'line-name'
  | 'label'
  | 'side'
  | 'piece-mark'
  | 'overlap'
  | 'title-job'
  | 'title-title'
  | 'title-note'
  | 'title-placement'
  | 'title-print'
  | 'caution'
  | 'calibration-caption'
  | 'bevel-band'
  | 'bevel-band-heading'
  /** A station's ordinate, written along its station line. */
  | 'station-ordinate'
  /** `SQUARE LINE, LONG POINT` or `SQUARE LINE, SHORT POINT`. */
  | 'reference-label'
  /** A line of the fit-up block (its heading bold). */
  | 'fit-up';

/** What a rectangle is for. */
export type SheetRectRole = 'overlap-tab' | 'calibration-bar';

/** A line, arc or polyline of the sheet. */
export interface SheetPath {
  readonly kind: 'path';
  readonly role: SheetPathRole;
  readonly layer: SheetLayer;
  readonly part: PathPart;
  /** For `station-line`: the station number. */
  readonly station?: number;
}

/**
 * A block of text. `at` is the first line's baseline point: its middle when
 * `anchor` is `middle`, its left end when `start`; further lines follow
 * `lineMm` below. Text is already cleaned of control characters (one entry of
 * `lines` per line); writers still escape it for their format.
 */
export interface SheetText {
  readonly kind: 'text';
  readonly role: SheetTextRole;
  readonly layer: SheetLayer;
  readonly lines: readonly string[];
  readonly at: Point2;
  readonly anchor: 'middle' | 'start';
  /** Font size (em), mm. */
  readonly fontMm: number;
  /** Cap height, mm (`fontMm` × 0.73): what a DXF calls the text height. */
  readonly capHeightMm: number;
  /** Distance between baselines, mm. */
  readonly lineMm: number;
  readonly bold: boolean;
  /** Turned counter-clockwise (y-up) by this many degrees about `pivot`; 0 or 90. */
  readonly rotateDeg: 0 | 90;
  readonly pivot: Point2;
  /** Everything the glyphs may cover before turning, mm (a safe over-estimate). */
  readonly box: Box;
  /** For `station-number`: the stations it names (one number may name several, e.g. `2/8`). */
  readonly stations?: readonly number[];
}

/** A rectangle: the glue tab (outlined) or the calibration bar (filled). */
export interface SheetRect {
  readonly kind: 'rect';
  readonly role: SheetRectRole;
  readonly layer: SheetLayer;
  readonly box: Box;
  readonly filled: boolean;
}

/** One thing on the sheet. */
export type SheetItem = SheetPath | SheetText | SheetRect;

/** The whole sheet of one template. */
export interface SheetPlan {
  readonly kind: 'sheet-plan';
  /** The template drawn: its id, kind, title and notes (cleaned to one line each), and what it goes on. */
  readonly template: {
    readonly id: string;
    readonly kind: TemplateKind;
    readonly title: string;
    readonly notes: readonly string[];
    /** Wraps: pi x the OD, mm. */
    readonly stretchOutMm?: number;
    /** Wraps and holes: the OD it goes on, mm. */
    readonly wrapOdMm?: number;
  };
  readonly units: SheetUnits;
  /** The job and piece as given (not cleaned), or `undefined`. */
  readonly job: string | undefined;
  readonly piece: string | undefined;
  /** The glue tab's width, mm (0 when the sheet has none). */
  readonly overlapMm: number;
  /** The paper: its top-left corner in template mm (y-up) and its size, mm. */
  readonly page: { readonly left: number; readonly top: number; readonly widthMm: number; readonly heightMm: number };
  /** What is drawn, title block excluded, mm (y-up): lines grown by half the widest stroke, and their text. */
  readonly drawing: Box;
  /** In drawing order: glue tab, marks, station lines, numbers and quarter-line names, square line, cut, labels, title block, calibration. */
  readonly items: readonly SheetItem[];
}

/** Options of {@link planSheet}; every field is optional, lengths in mm whatever the sheet units. */
export interface SheetOptions {
  /** Units the title block writes lengths in: `'mm'` (default) or `'in'`. */
  readonly sheetUnits?: SheetUnits;
  /** Blank paper around everything drawn, mm, 0 to 100. Default 10. */
  readonly marginMm?: number;
  /** Wraps only: glue tab past the stretch-out, mm, 0 to 200. Default 25; 0 draws none. */
  readonly overlapMm?: number;
  /** The job, as the user wrote it. At most 200 characters. */
  readonly job?: string;
  /** The piece or spool, as the user wrote it. At most 200 characters. */
  readonly piece?: string;
  /** Title block text size as a multiple of the standard size, 0.01 to 50. Default 1. */
  readonly textScale?: number;
  /** Number the station lines; default true. */
  readonly stationNumbers?: boolean;
  /**
   * Put the `paper` layer's items (glue tab and its hatching, title rule,
   * calibration bar and caption) in the plan; default true. A writer that
   * leaves them out (the DXF) asks for `false`: the page, the drawing box and
   * every other item stay exactly where they are.
   */
  readonly paper?: boolean;
}

/** {@link SheetOptions} with every default filled in and every value checked. */
export interface ResolvedSheetOptions {
  readonly sheetUnits: SheetUnits;
  readonly marginMm: number;
  readonly overlapMm: number;
  readonly job: string | undefined;
  readonly piece: string | undefined;
  readonly textScale: number;
  readonly stationNumbers: boolean;
  readonly paper: boolean;
}
