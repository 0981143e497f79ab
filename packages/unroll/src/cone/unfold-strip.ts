/**
 * Triangulation: unfolds a strip of triangles between two edges of a
 * developable surface into the plane, triangle by triangle, from the true
 * lengths of their sides.
 */
import { cross, dot, norm, sub, type Vec3 } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import type { Point2 } from '../types.js';

/** The two edges of a strip on the flat, point for point as given in 3D (mm). */
export interface UnfoldedStrip {
  readonly large: readonly Point2[];
  readonly small: readonly Point2[];
}

/**
 * Unfolds the strip between the edge points `large[i]` and `small[i]` (3D,
 * mm; the same count on both edges, at least 2 each) onto the flat.
 *
 * The strip is cut into triangles `(large[i], small[i], small[i+1])` and
 * `(large[i], small[i+1], large[i+1])`: the elements `large[i]–small[i]` and
 * the diagonals `large[i]–small[i+1]`. Each triangle is laid down from the
 * true lengths of its sides against the side it shares with the one before,
 * on the far side of it, so every element, diagonal and edge step keeps its 3D
 * length exactly. The first triangle is laid as seen from the side that
 * `viewFrom` points to (e.g. the outward normal: the pattern as seen from the
 * outside). `large[0]` lands at the origin and `small[0]` straight below it.
 *
 * @throws GirthError `BAD_OPTION` (field `strip`) for edges of different or too few points,
 *   or a triangle with a side of zero length.
 * @example
 * // A flat square seen from +y: the large edge runs to the left of the first element.
 * unfoldStrip([[0, 0, 0], [1, 0, 0]], [[0, 0, -1], [1, 0, -1]], [0, 1, 0]).large[1] // ≈ [-1, 0]
 */
export function unfoldStrip(large: readonly Vec3[], small: readonly Vec3[], viewFrom: Vec3): UnfoldedStrip {
  const n = large.length;
  if (n < 2 || small.length !== n) {
    throw new GirthError('BAD_OPTION', 'strip', `strip: needs the same number (≥ 2) of points on both edges, got ${n} and ${small.length}`, n);
  }
  const A = large as readonly Vec3[];
  const B = small as readonly Vec3[];
  const a: Point2[] = new Array<Point2>(n);
  const b: Point2[] = new Array<Point2>(n);
  const a0 = A[0] as Vec3;
  const b0 = B[0] as Vec3;
  a[0] = [0, 0];
  b[0] = [0, -length(a0, b0)];

  // First triangle (A0, B0, B1): its turn on the flat matches its turn seen from `viewFrom`.
  const b1 = B[1] as Vec3;
  const turn3 = dot(cross(sub(b0, a0), sub(b1, a0)), viewFrom);
  b[1] = place(a[0], b[0], length(a0, b1), length(b0, b1), turn3 >= 0 ? 1 : -1);
  for (let i = 0; i < n - 1; i++) {
    if (i > 0) {
      // (A_i, B_i, B_{i+1}) shares A_i–B_i with (A_{i-1}, B_i, A_i): lay it on the far side of A_{i-1}.
      b[i + 1] = placeAcross(a[i] as Point2, b[i] as Point2, a[i - 1] as Point2, length(A[i] as Vec3, B[i + 1] as Vec3), length(B[i] as Vec3, B[i + 1] as Vec3));
    }
    // (A_i, B_{i+1}, A_{i+1}) shares A_i–B_{i+1} with (A_i, B_i, B_{i+1}): far side of B_i.
    a[i + 1] = placeAcross(a[i] as Point2, b[i + 1] as Point2, b[i] as Point2, length(A[i] as Vec3, A[i + 1] as Vec3), length(B[i + 1] as Vec3, A[i + 1] as Vec3));
  }
  return { large: a, small: b };
}

function length(p: Vec3, q: Vec3): number {
  return norm(sub(p, q));
}

/** The point at `distP` from p and `distQ` from q, on the side of line p→q away from `away`. */
function placeAcross(p: Point2, q: Point2, away: Point2, distP: number, distQ: number): Point2 {
  const side = (q[0] - p[0]) * (away[1] - p[1]) - (q[1] - p[1]) * (away[0] - p[0]);
  return place(p, q, distP, distQ, side > 0 ? -1 : 1);
}

/** The point at `distP` from p and `distQ` from q, left of p→q for sign +1, right for −1. */
function place(p: Point2, q: Point2, distP: number, distQ: number, sign: 1 | -1): Point2 {
  const dx = q[0] - p[0];
  const dy = q[1] - p[1];
  const d = Math.hypot(dx, dy);
  if (!(d > 0) || !(distP > 0) || !(distQ > 0)) {
    throw new GirthError('BAD_OPTION', 'strip', 'strip: a triangle has a side of zero length; the edges must not touch', d);
  }
  const along = (distP * distP - distQ * distQ + d * d) / (2 * d);
  const h = Math.sqrt(Math.max(0, distP * distP - along * along));
  const ux = dx / d;
  const uy = dy / d;
  return [p[0] + along * ux - sign * h * uy, p[1] + along * uy + sign * h * ux];
}
