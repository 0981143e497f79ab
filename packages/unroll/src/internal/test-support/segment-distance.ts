/**
 * Distance on the flat from a point to a straight segment, in mm.
 */
import type { Point2 } from '../../types.js';

/**
 * The shortest distance from `p` to the segment `a`–`b` (mm). A degenerate
 * segment (a = b) gives the distance to `a`.
 * @example distanceToSegment([1, 1], [0, 0], [2, 0]) // 1
 */
export function distanceToSegment(p: Point2, a: Point2, b: Point2): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const lenSq = dx * dx + dy * dy;
  let s = lenSq === 0 ? 0 : ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / lenSq;
  if (s < 0) s = 0;
  else if (s > 1) s = 1;
  return Math.hypot(p[0] - a[0] - s * dx, p[1] - a[1] - s * dy);
}
