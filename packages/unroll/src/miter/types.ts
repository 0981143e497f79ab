/**
 * The layout of a miter elbow: templates for each kind of piece and the cut list.
 */
import type { CutFitSurface, MiterPieceCut, MiterStockPlan } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/**
 * A miter elbow laid out. `templates[0]` is the `miter-end` wrap (both end
 * pieces), `templates[1]` the `miter-middle` wrap when the elbow has middle
 * pieces (two or more welds). `pieces` lists each kind of piece with its
 * count and lengths (mm) on the centreline, back and throat; `stock` gives the
 * straight length needed and the cuts in order along it. Angles in degrees,
 * lengths in mm.
 */
export interface MiterLayout extends LayoutResultBase {
  readonly kind: 'miter';
  readonly templates: readonly Template[];
  readonly bendDeg: number;
  readonly welds: number;
  readonly pieceCount: number;
  /** bend / (2 × welds), degrees. */
  readonly cutAngleDeg: number;
  /** Centreline radius, mm. */
  readonly radiusMm: number;
  /** Straight length added to each end piece, mm. */
  readonly tangentMm: number;
  readonly fitSurface: CutFitSurface;
  /** Root gap at every weld, mm, square to the weld plane (0 when none); the pieces and the stock allow for it. */
  readonly gapMm: number;
  readonly stations: number;
  readonly pieces: readonly MiterPieceCut[];
  readonly stock: MiterStockPlan;
  /** Straight stock needed, mm (the sum of the pieces' centre lengths; no kerf allowance). */
  readonly stockLengthMm: number;
}
