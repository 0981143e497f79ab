/**
 * The layout of a nozzle in a dished head: its two templates and what was solved.
 */
import type { BranchFit, NozzleDirection } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/** Options of `layoutNozzle`. */
export interface LayoutNozzleOptions {
  /** Number of stations around the nozzle, a whole number from 4 to 360; default 16 (common practice). */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true curve, mm; default 0.05. */
  readonly chordToleranceMm?: number;
}

/**
 * A nozzle laid out: `templates[0]` is the `nozzle-cut` wrap (on the nozzle
 * OD), `templates[1]` the `head-hole` (the hole's outline seen along the
 * nozzle axis, with each station's drop and its tape distances over the
 * head). The solved joint is echoed: offset and gap (mm), direction, tilt
 * (degrees), fit.
 */
export interface NozzleLayout extends LayoutResultBase {
  readonly kind: 'nozzle';
  readonly templates: readonly [Template, Template];
  readonly offsetMm: number;
  readonly direction: NozzleDirection;
  readonly tiltDeg: number;
  readonly fit: BranchFit;
  readonly gapMm: number;
  readonly stations: number;
  /** The most a tape pulled straight around a parallel can read under the table's `around`, mm (the hole template's stated bound). */
  readonly aroundTapeBoundMm: number;
}
