/**
 * Plain data of miter elbows. Lengths in mm, angles in degrees where a name says
 * `Deg`. Pieces are numbered from the start of the elbow (0-based `index`),
 * welds from 1.
 */
import type { GirthWarning } from '@girth/pipes';
import type { CutFitSurface } from '../plane-cut/fit-surface.js';
import type { PipeSection, ResolvedPipeSection } from '../pipe-section.js';
import type { GeneratorBundle, PlaneSurface } from '../types.js';
import type { Vec3 } from '../vec3.js';

/**
 * A miter elbow: a bend made of straight pieces welded on planes.
 * Give exactly one of `welds` and `pieces` (pieces = welds + 1) and exactly one
 * of `radiusMm` and `radiusNps`.
 */
export interface MiterSpec {
  readonly pipe: PipeSection;
  /** Total change of direction, degrees, in (0, 180]. */
  readonly bendDeg: number;
  /** Number of welds (miter joints), a whole number ≥ 1. */
  readonly welds?: number;
  /** Number of pieces, a whole number ≥ 2. */
  readonly pieces?: number;
  /** Centreline radius of the bend, mm, at least half the OD. */
  readonly radiusMm?: number;
  /** Centreline radius as a multiple of the nominal size (1.5 gives 1.5 × NPS); needs `pipe.npsIn`. */
  readonly radiusNps?: number;
  /** Straight length added to each end piece beyond its tangent point, mm, ≥ 0 (default 0). */
  readonly tangentMm?: number;
  /** Which pipe surface meets the weld planes (default `od`), see {@link CutFitSurface}. */
  readonly fitSurface?: CutFitSurface;
  /**
   * Root gap at every weld, mm, ≥ 0 (default 0), measured square to the weld
   * plane: each piece end is set back half of it from its weld plane, so the
   * pieces (and the stock) are shorter and the bend and radius stay as asked.
   */
  readonly gapMm?: number;
}

/** A checked miter spec with everything resolved. */
export interface ResolvedMiterSpec {
  readonly kind: 'miter-spec';
  readonly pipe: ResolvedPipeSection;
  readonly bendDeg: number;
  readonly welds: number;
  /** welds + 1. */
  readonly pieceCount: number;
  /** bend / (2 × welds), degrees, in (0, 90). */
  readonly cutAngleDeg: number;
  readonly radiusMm: number;
  readonly tangentMm: number;
  readonly fitSurface: CutFitSurface;
  /** Radius of the generators that meet the weld planes, mm. */
  readonly fitRadiusMm: number;
  /** Root gap at every weld, mm, square to the weld plane (0 when none). */
  readonly gapMm: number;
}

/**
 * One cut end of a piece: the piece's generators running toward the weld
 * plane, and the plane the end is cut to (its normal toward the piece): the
 * weld plane itself, or with a root gap the weld plane moved half the gap
 * into the piece.
 */
export interface MiterCutEnd {
  readonly kind: 'miter-cut-end';
  /** 1-based number of the weld this end meets. */
  readonly weld: number;
  readonly bundle: GeneratorBundle;
  readonly host: PlaneSurface;
}

/**
 * A piece in the assembled elbow. Its heel (phi = 0) is on the throat, toward
 * the bend centre; phi = 90° is along the bend axis (+z) on both of its ends.
 */
export interface MiterPiece3d {
  readonly kind: 'miter-piece';
  /** 0-based position along the elbow. */
  readonly index: number;
  readonly role: 'end' | 'middle';
  /** Unit direction of the piece's axis, from the elbow's start toward its end. */
  readonly direction: Vec3;
  /** Unit vector from the axis toward the throat (the bend centre side). */
  readonly heelDirection: Vec3;
  /** Unit vector along the bend axis (phi = 90°). */
  readonly sideDirection: Vec3;
  /** Where the centreline touches the bend circle: the middle of a middle piece, the tangent point of an end piece, mm. */
  readonly tangentPoint: Vec3;
  /** The cut toward the start of the elbow; absent on the first piece (square end). */
  readonly nearCut?: MiterCutEnd;
  /** The cut toward the end of the elbow; absent on the last piece (square end). */
  readonly farCut?: MiterCutEnd;
  /** Centre of the square end of an end piece (tangent included), mm. */
  readonly squareEndCenter?: Vec3;
}

/**
 * The assembled elbow in 3D. The bend centre is the origin and the bend axis
 * is +z; the elbow starts along +x at the tangent point (0, −R, 0) and turns
 * toward +y.
 */
export interface MiterGeometry {
  readonly kind: 'miter-geometry';
  readonly spec: ResolvedMiterSpec;
  readonly bendCenter: Vec3;
  /** Unit vector of the bend axis (square to the plane of the bend). */
  readonly bendAxis: Vec3;
  /** The weld planes in order; each contains the bend axis and its normal points from piece k−1 toward piece k. */
  readonly weldPlanes: readonly PlaneSurface[];
  readonly pieces: readonly MiterPiece3d[];
  readonly warnings: readonly GirthWarning[];
}

/** The lengths of one kind of piece, measured along it between its ends, mm. */
export interface MiterPieceCut {
  readonly kind: 'miter-piece-cut';
  /** `End piece` or `Middle piece`. */
  readonly label: string;
  /** Id of the template that lays it out. */
  readonly templateId: 'miter-end' | 'miter-middle';
  /** How many of these the elbow takes. */
  readonly count: number;
  /** Length along the centreline, mm (tangent included for end pieces). */
  readonly center: number;
  /** Length on the back (outside of the bend, phi = 180°), mm. */
  readonly back: number;
  /** Length on the throat (inside of the bend, phi = 0), mm. */
  readonly throat: number;
}

/**
 * One torch cut across the straight stock. Positions run along the stock from
 * its start; the reference line is a straight line marked along the stock on
 * the throat of the first piece.
 */
export interface MiterStockCut {
  readonly kind: 'miter-stock-cut';
  /** 1-based, also the number of the weld the cut makes. */
  readonly n: number;
  /** Where the cut crosses the stock's centreline, mm from the stock's start. */
  readonly centerAtMm: number;
  /** Where the cut crosses the reference line, mm from the stock's start. */
  readonly referenceLineAtMm: number;
  /** Where the cut crosses the line 180° round from the reference line, mm. */
  readonly oppositeLineAtMm: number;
  /** Angle round the stock from the reference line, degrees (0 or 180), at which the piece before this cut is longest (its back). */
  readonly longSideDeg: 0 | 180;
}

/** How the pieces come out of one straight length, with nothing wasted between them. */
export interface MiterStockPlan {
  readonly kind: 'miter-stock-plan';
  /** Straight stock needed, mm: the sum of the pieces' centre lengths (no allowance for kerf). */
  readonly lengthMm: number;
  /** The cuts in order along the stock. */
  readonly cuts: readonly MiterStockCut[];
  /** Each piece after a cut is turned this many degrees about its axis before it is fitted: 180. */
  readonly turnEachNextDeg: 180;
}

/** The cut list of a miter elbow: the distinct pieces and the order of cuts from straight stock. */
export interface MiterCutList {
  readonly kind: 'miter-cut-list';
  readonly pieces: readonly MiterPieceCut[];
  readonly stock: MiterStockPlan;
}
