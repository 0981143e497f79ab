/**
 * How far apart two closed contours on the flat are: the clearance a weld zone
 * needs, and whether they overlap at all.
 */
import type { Point2 } from '../types.js';

/** Distance from point p to the segment a-b, mm. */
function pointSegmentMm(p: Point2, a: Point2, b: Point2): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

/** True when the point lies inside the closed polygon (even-odd rule). */
export function insidePolygon(p: Point2, polygon: readonly Point2[]): boolean {
  let odd = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i]!;
    const [xj, yj] = polygon[j]!;
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) odd = !odd;
  }
  return odd;
}

/**
 * The gap between two closed polygons, mm: the least distance between their
 * edges, or 0 when they overlap (an edge of one crosses the other, or one lies
 * inside the other). Vertices are checked against the other's edges, which is
 * exact for polygons that do not cross (the least distance between two
 * segments that do not cross is at an end of one of them).
 *
 * @example contourGapMm([[0,0],[1,0],[1,1],[0,1]], [[3,0],[4,0],[4,1],[3,1]]) // 2
 */
export function contourGapMm(a: readonly Point2[], b: readonly Point2[]): number {
  if (insidePolygon(a[0]!, b) || insidePolygon(b[0]!, a)) return 0;
  let best = Infinity;
  const edgesOf = (poly: readonly Point2[], p: Point2): number => {
    let m = Infinity;
    for (let i = 0; i < poly.length; i++) m = Math.min(m, pointSegmentMm(p, poly[i]!, poly[(i + 1) % poly.length]!));
    return m;
  };
  for (const p of a) best = Math.min(best, edgesOf(b, p));
  for (const p of b) best = Math.min(best, edgesOf(a, p));
  // Crossing edges with every vertex outside the other polygon: the vertex test above cannot see it.
  if (best > 0 && edgesCross(a, b)) return 0;
  return best;
}

function cross(o: Point2, a: Point2, b: Point2): number {
  return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
}

function edgesCross(a: readonly Point2[], b: readonly Point2[]): boolean {
  for (let i = 0; i < a.length; i++) {
    const p = a[i]!;
    const q = a[(i + 1) % a.length]!;
    for (let j = 0; j < b.length; j++) {
      const r = b[j]!;
      const s = b[(j + 1) % b.length]!;
      if (Math.sign(cross(p, q, r)) * Math.sign(cross(p, q, s)) < 0 && Math.sign(cross(r, s, p)) * Math.sign(cross(r, s, q)) < 0) return true;
    }
  }
  return false;
}
