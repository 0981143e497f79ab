/**
 * Fit-up of a miter elbow: where each weld line falls on the straight stock,
 * the angle check of each joint and the elbow's end-to-end dimensions.
 */
import { miterCutList, miterGeometry, type MiterGeometry, type MiterSpec } from '@girth/geometry';
import { angleCheck, type AngleCheck, type AngleCheckOptions } from './angle-check.js';
import { locateCutExtremes, measureCutDepth, type CutDepth } from './cut-depth.js';

/** Sine of the angle below which the two end pieces' axes count as parallel (a 180° return bend). */
const PARALLEL_SIN_EPS = 1e-12;

/** One weld line on the straight stock, where it crosses the stock's centreline. Lengths in mm. */
export interface StockWeldLine {
  /** 1-based weld number, from the start of the elbow. */
  readonly weld: number;
  /** From the stock's start (the first end piece's square end), mm. */
  readonly fromStartMm: number;
  /** From the stock's other end, mm. */
  readonly fromEndMm: number;
  /** Where the line crosses the straight reference line marked along the stock, mm from the start. */
  readonly referenceLineAtMm: number;
  /** Where it crosses the line opposite the reference line, mm from the start. */
  readonly oppositeLineAtMm: number;
}

/** The angle check of one joint of the elbow. */
export interface MiterJointCheck {
  readonly weld: number;
  /** Change of direction at the joint: bend / welds, degrees (the angle between the axes of the pieces either side). */
  readonly deflectionDeg: number;
  readonly angleCheck: AngleCheck;
}

/** Options of {@link miterFitUp}: the lengths of the angle checks. */
export type MiterFitUpOptions = AngleCheckOptions;

/** Fit-up dimensions of a miter elbow. Lengths in mm, angles in degrees. */
export interface MiterFitUp {
  readonly kind: 'miter-fit-up';
  /** Straight stock the pieces come out of, mm (no kerf allowance). */
  readonly stockLengthMm: number;
  /** Every weld line on the stock, in order from its start. */
  readonly weldLines: readonly StockWeldLine[];
  /** The check of every joint (all joints turn by the same angle). */
  readonly joints: readonly MiterJointCheck[];
  readonly bendDeg: number;
  /** Centreline radius of the bend, mm. */
  readonly radiusMm: number;
  /**
   * From where the axes of the two end pieces meet to the face of each square
   * end, mm: R tan(B/2) plus the tangent. Left out for a 180° bend (the end
   * axes are parallel; see `endAxesApartMm`).
   */
  readonly centreToFaceMm?: number;
  /** For a 180° bend: the distance between the axes of the two ends, 2R, mm. */
  readonly endAxesApartMm?: number;
  /** Depths of the cuts of the `miter-end` and `miter-middle` templates, for `ordinatesFrom`. */
  readonly cutDepths: readonly CutDepth[];
}

/**
 * Fit-up dimensions of a miter elbow: each weld line's position on the
 * straight stock from its start (from the cut list, pieces in elbow order),
 * the tape-and-square check of each joint (its change of direction, bend /
 * welds), the centre to face of the elbow (measured on the assembled 3D
 * elbow: where the end pieces' axes meet, to each square end) and the depths
 * of the template cuts.
 *
 * @throws GirthError as `miterGeometry` (bad spec); those of `angleCheck` for the options.
 * @example miterFitUp({ pipe: { odMm: 323.85, wallMm: 9.525 }, bendDeg: 90, welds: 3, radiusMm: 457.2 }).centreToFaceMm // 457.2
 */
export function miterFitUp(spec: MiterSpec, options: MiterFitUpOptions = {}): MiterFitUp {
  const g = miterGeometry(spec);
  const list = miterCutList(g);
  const s = g.spec;
  const deflectionDeg = s.bendDeg / s.welds;
  const check = angleCheck(deflectionDeg, options);
  const stock = list.stock;
  return {
    kind: 'miter-fit-up',
    stockLengthMm: stock.lengthMm,
    weldLines: stock.cuts.map((c) => ({
      weld: c.n,
      fromStartMm: c.centerAtMm,
      fromEndMm: stock.lengthMm - c.centerAtMm,
      referenceLineAtMm: c.referenceLineAtMm,
      oppositeLineAtMm: c.oppositeLineAtMm,
    })),
    joints: Array.from({ length: s.welds }, (_, i) => ({ weld: i + 1, deflectionDeg, angleCheck: check })),
    bendDeg: s.bendDeg,
    radiusMm: s.radiusMm,
    ...endToEnd(g),
    cutDepths: cutDepths(g),
  };
}

/** Where the axes of the end pieces meet, and the distance from there to each square end. */
function endToEnd(g: MiterGeometry): { centreToFaceMm: number } | { endAxesApartMm: number } {
  const first = g.pieces[0]!;
  const last = g.pieces[g.pieces.length - 1]!;
  const p = first.squareEndCenter ?? first.tangentPoint;
  const q = last.squareEndCenter ?? last.tangentPoint;
  const d = first.direction;
  const f = last.direction;
  // Both axes lie in the plane of the bend (z = 0): solve p + t d = q + u f in x and y.
  const cross = d[0] * f[1] - d[1] * f[0];
  if (Math.abs(cross) <= PARALLEL_SIN_EPS) {
    return { endAxesApartMm: Math.abs((q[0] - p[0]) * d[1] - (q[1] - p[1]) * d[0]) };
  }
  const t = ((q[0] - p[0]) * f[1] - (q[1] - p[1]) * f[0]) / cross;
  return { centreToFaceMm: Math.abs(t) };
}

function cutDepths(g: MiterGeometry): CutDepth[] {
  const depths: CutDepth[] = [];
  const first = g.pieces[0];
  if (first?.farCut) depths.push(measureCutDepth(first.farCut.bundle, first.farCut.host, { templateId: 'miter-end' }));
  const middle = g.pieces[1];
  if (g.spec.welds >= 2 && middle?.nearCut && middle.farCut) {
    const near = middle.nearCut;
    const far = middle.farCut;
    // As developTwoCutWrap: y runs from the near square line (y = 0) to the far one at the sum of the two long points.
    const spanMm = locateCutExtremes(near.bundle, near.host).long.value + locateCutExtremes(far.bundle, far.host).long.value;
    depths.push(measureCutDepth(near.bundle, near.host, { templateId: 'miter-middle' }));
    depths.push(measureCutDepth(far.bundle, far.host, { templateId: 'miter-middle', columnKey: 'cutbackFar', longLineYMm: spanMm, cutbackDirection: -1 }));
  }
  return depths;
}
