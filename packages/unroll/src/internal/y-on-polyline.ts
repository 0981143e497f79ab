/**
 * Height of a polyline that runs left to right, at a given x.
 */
import type { Point2 } from '../types.js';

/**
 * y of the polyline (ascending in x) at `x`, by linear interpolation; the end
 * value outside its span.
 *
 * @example yOnPolyline([[0, 0], [10, 5]], 4) // 2
 */
export function yOnPolyline(points: readonly Point2[], x: number): number {
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((points[mid] as Point2)[0] <= x) lo = mid;
    else hi = mid;
  }
  const a = points[lo] as Point2;
  const b = points[hi] as Point2;
  const span = b[0] - a[0];
  if (span === 0) return a[1];
  const t = Math.min(1, Math.max(0, (x - a[0]) / span));
  return a[1] + (b[1] - a[1]) * t;
}
