/**
 * What a template carries once its joint's fit-up is applied (see
 * `withFitUp`): which square line its ordinates are measured from, each
 * station's ordinate worded for the job with the stretch of station line it is
 * measured along, the square lines to draw, and the fit-up lines.
 */
import type { Point2 } from '../types.js';
import type { OrdinateReference } from './ordinate-reference.js';
import type { OrdinateColumn } from './ordinates-from.js';
import type { ReferenceLines } from './reference-lines.js';

/** One station's ordinate on a wrap: the value worded in the job's unit and where it is measured. Lengths in mm (template coordinates). */
export interface StationOrdinate {
  /** 1-based station number. */
  readonly n: number;
  /** The column it belongs to (`cutback`, `ordinate`, `cutbackFar`, `ordinateFar`). */
  readonly columnKey: string;
  /** The ordinate, mm (≥ 0). */
  readonly valueMm: number;
  /** The ordinate in the job's unit, e.g. `2 3/16"` or `55.6 mm`. */
  readonly text: string;
  /** On the square line measured from, at the station's girth. */
  readonly from: Point2;
  /** On the cut, at the station's girth. */
  readonly to: Point2;
  /** Which way y runs from the square line toward the cut (+1 up the template, −1 down), even where the two meet. */
  readonly towardCut: 1 | -1;
}

/** A template's ordinates as `withFitUp` measured and worded them. */
export interface TemplateOrdinates {
  readonly kind: 'template-ordinates';
  readonly reference: OrdinateReference;
  /** e.g. `measured from the square line through the short point`. */
  readonly referenceWords: string;
  /** The re-referenced columns with the depth of each cut and the stock past the short point. */
  readonly columns: readonly OrdinateColumn[];
  /** Every station of every column, worded, with the stretch of station line it is measured along. */
  readonly stations: readonly StationOrdinate[];
  /**
   * Square lines to draw across the wrap: both lines of each cut when asked
   * for, else the short-point line alone when the ordinates are measured from
   * it, else none.
   */
  readonly referenceLines: readonly ReferenceLines[];
  /** Whether both square lines were asked for (then their labels are drawn too). */
  readonly bothLines: boolean;
  /** One sentence a column naming the reference, the full depth and the stock to leave past the short point, in the job's unit. */
  readonly lines: readonly string[];
}
