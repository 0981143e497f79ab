/**
 * The layout of a trunnion (or branch) on an elbow: its two templates and what was solved.
 */
import type { BranchFit, TrunnionDirection } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/** Options of `layoutTrunnion`. */
export interface LayoutTrunnionOptions {
  /** Number of stations around the trunnion, a whole number from 4 to 360; default 16 (common practice). */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true curve, mm; default 0.05. */
  readonly chordToleranceMm?: number;
}

/**
 * A trunnion laid out: `templates[0]` is the `trunnion-cut` wrap (on the
 * trunnion OD), `templates[1]` the `elbow-hole` (the hole's outline seen
 * along the trunnion axis, with each station's drop and its tape distances
 * over the elbow from the inlet end's extrados). The solved joint is echoed.
 */
export interface TrunnionLayout extends LayoutResultBase {
  readonly kind: 'trunnion';
  readonly templates: readonly [Template, Template];
  /** Centreline radius of the elbow, mm. */
  readonly bendRadiusMm: number;
  readonly bendDeg: number;
  readonly alongDeg: number;
  readonly aroundDeg: number;
  readonly direction: TrunnionDirection;
  /** Angle between the trunnion axis and the elbow's normal at its point, degrees. */
  readonly tiltFromNormalDeg: number;
  readonly fit: BranchFit;
  readonly gapMm: number;
  readonly stations: number;
  /** The most a tape pulled straight along the bend can read under the table's `along`, mm (the hole template's stated bound). */
  readonly alongTapeBoundMm: number;
}
