/**
 * The layout of a pipe end cut to meet a plane.
 */
import type { CutFitSurface } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/**
 * A plane cut laid out: one `plane-cut` wrap template on the pipe OD, with the
 * station table (`girth`, `cutback`: the ordinates). Echoes the cut: angles in
 * degrees, lengths in mm.
 */
export interface PlaneCutLayout extends LayoutResultBase {
  readonly kind: 'plane-cut';
  readonly templates: readonly [Template];
  /** Angle between the pipe axis and the plane, degrees. */
  readonly angleDeg: number;
  /** How far the cut leans from square, 90 − angleDeg, degrees. */
  readonly cutAngleDeg: number;
  readonly gapMm: number;
  readonly fitSurface: CutFitSurface;
  readonly stations: number;
  /** From the square line (through the long point) back to where the pipe axis meets the cut, mm. */
  readonly centerCutbackMm: number;
  /** How far the root gap moves the cut back along the axis, gap / sin(angle), mm. */
  readonly gapSetbackMm: number;
}
