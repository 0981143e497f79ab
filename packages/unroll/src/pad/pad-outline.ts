/**
 * The pad's two edges on the header OD (the pad's inside surface), in the
 * header OD's development: the hole the branch passes through and the outer
 * edge at the given ring width or outside size. Distances over a cylinder's
 * surface are straight-line distances in its development (the cylinder
 * develops without stretching), so the ring width is a plane offset here.
 */
import { branchBundle, developPoint, hitGenerator, solveBranch, type BranchGeometry, type CylinderSurface } from '@girth/geometry';
import { GirthError, requirePositive } from '@girth/pipes';
import type { Point2 } from '../types.js';
import type { PadSpec } from './types.js';

/** Samples around the hole for the drawn edges (each chord checked against the tolerance). */
const MIN_EDGE_SAMPLES = 720;

/** The pad's edges on the header OD development, mm (x girth from the top line, y axial). */
export interface PadEdges {
  readonly geometry: BranchGeometry;
  /** The header OD the edges lie on. */
  readonly headerOd: CylinderSurface;
  /** Where the branch OD meets the header OD, counter-clockwise, phi from the heel. */
  readonly hole: readonly Point2[];
  /** Branch angle phi of each `hole` point, radians. */
  readonly holePhis: readonly number[];
  /** The pad's outer edge, counter-clockwise. */
  readonly outer: readonly Point2[];
  /** Where the branch axis meets the header OD. */
  readonly centre: Point2;
  readonly sizedBy: 'width' | 'outside';
  /** Least ring width over the header surface, mm. */
  readonly widthMm: number;
}

/**
 * The branch OD's trace on the header OD (the hole in the pad, on the pad's
 * inside surface) and the pad's outer edge, both on the header OD development.
 *
 * @throws GirthError `NEGATIVE` on `thicknessMm`, `widthMm` or `outsideMm` at
 *   or below 0; `BAD_OPTION` (field `widthMm`) when both or neither size is
 *   given; `PAD_SIZE` (field `outsideMm`) when the outside size does not
 *   clear the hole, (field `widthMm` or `outsideMm`) when the pad would wrap
 *   right round the header; `BRANCH_TOO_LARGE` (field `branch`) when the
 *   branch OD does not meet the header OD all round; every error of `solveBranch`.
 * @example padEdges({ branch: { header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 } }, thicknessMm: 9.5, widthMm: 80 }).widthMm // 80
 */
export function padEdges(spec: PadSpec, samples = MIN_EDGE_SAMPLES): PadEdges {
  requirePositive(spec.thicknessMm, 'thicknessMm');
  if ((spec.widthMm === undefined) === (spec.outsideMm === undefined)) {
    throw new GirthError('BAD_OPTION', 'widthMm', 'widthMm: give the pad either its ring width or its outside size, not both or neither');
  }
  const g = solveBranch(spec.branch);
  const headerOd: CylinderSurface = { ...(g.holeHost as CylinderSurface) };
  const bundle = branchBundle(g.angleRad, g.spec.offsetMm, g.spec.branch.odMm / 2);
  const holePhis: number[] = [];
  const hole: Point2[] = [];
  for (let i = 0; i < samples; i++) {
    const phi = (2 * Math.PI * i) / samples;
    const hit = hitGenerator(bundle, headerOd, phi);
    if (hit === undefined) {
      throw new GirthError('BRANCH_TOO_LARGE', 'branch', 'branch: the branch OD runs past the sides of the header OD, so a pad cannot go round it (a full wrapper plate is not laid out)');
    }
    holePhis.push(phi);
    hole.push(developPoint(headerOd, hit.point));
  }
  const ccwHole = signedArea(hole) >= 0 ? hole : [...hole].reverse();
  const phis = ccwHole === hole ? holePhis : [...holePhis].reverse();
  const axisHit = hitGenerator({ ...bundle, radius: 0 }, headerOd, 0);
  const centre = axisHit === undefined ? ([0, 0] as Point2) : developPoint(headerOd, axisHit.point);

  let outer: Point2[];
  let widthMm: number;
  let field: 'widthMm' | 'outsideMm';
  if (spec.widthMm !== undefined) {
    widthMm = requirePositive(spec.widthMm, 'widthMm');
    field = 'widthMm';
    outer = offsetConvex(ccwHole, widthMm);
  } else {
    const outsideMm = requirePositive(spec.outsideMm, 'outsideMm');
    field = 'outsideMm';
    const r = outsideMm / 2;
    const reach = Math.max(...ccwHole.map((p) => Math.hypot(p[0] - centre[0], p[1] - centre[1])));
    if (r <= reach) {
      throw new GirthError('PAD_SIZE', 'outsideMm', `outsideMm: the pad's outside size must be more than the hole's largest size over the header surface, ${(2 * reach).toFixed(1)} mm`, outsideMm);
    }
    widthMm = r - reach;
    outer = circle(centre, r, samples);
  }
  const girths = outer.map((p) => p[0]);
  if (Math.max(...girths) - Math.min(...girths) >= 2 * Math.PI * headerOd.radius) {
    throw new GirthError('PAD_SIZE', field, `${field}: the pad would wrap right round the header (more than its circumference, ${(2 * Math.PI * headerOd.radius).toFixed(1)} mm); lay out a full wrapper plate instead`);
  }
  return { geometry: g, headerOd, hole: ccwHole, holePhis: phis, outer, centre, sizedBy: spec.widthMm !== undefined ? 'width' : 'outside', widthMm };
}

/** Twice-signed area / 2 of a closed polygon (positive counter-clockwise). */
export function signedArea(points: readonly Point2[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!;
    const q = points[(i + 1) % points.length]!;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
}

/**
 * A counter-clockwise convex closed curve (densely sampled) moved outward by
 * `d` along its normals: the curve at distance `d` from it. The hole of a
 * branch on a cylinder, developed, is convex.
 */
function offsetConvex(points: readonly Point2[], d: number): Point2[] {
  const n = points.length;
  return points.map((p, i) => {
    const a = points[(i - 1 + n) % n]!;
    const b = points[(i + 1) % n]!;
    const tx = b[0] - a[0];
    const ty = b[1] - a[1];
    const len = Math.hypot(tx, ty) || 1;
    // Outward of a counter-clockwise curve: the tangent turned clockwise.
    return [p[0] + (d * ty) / len, p[1] - (d * tx) / len] as Point2;
  });
}

function circle(c: Point2, r: number, samples: number): Point2[] {
  return Array.from({ length: samples }, (_, i) => {
    const t = (2 * Math.PI * i) / samples;
    return [c[0] + r * Math.cos(t), c[1] + r * Math.sin(t)] as Point2;
  });
}
