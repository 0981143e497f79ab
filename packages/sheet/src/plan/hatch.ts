/**
 * Hatching of the glue tab.
 */
import type { Point2 } from '@girth/unroll';

/**
 * 45° hatching of a rectangle given down the page (x right, y down, mm), clipped
 * to it exactly: the lines (x - x0) + (y - y0) = t for t = spacing, 2 spacing, ...
 * below its width plus height, each from its top end to its bottom end.
 *
 * @example hatchLines(0, 0, 10, 10, 4).length // 4
 */
export function hatchLines(x0: number, y0: number, x1: number, y1: number, spacingMm: number): [Point2, Point2][] {
  const w = x1 - x0;
  const h = y1 - y0;
  const out: [Point2, Point2][] = [];
  for (let t = spacingMm; t < w + h; t += spacingMm) {
    const yTop = y0 + Math.max(0, t - w);
    const yBottom = y0 + Math.min(h, t);
    out.push([
      [x0 + t - (yTop - y0), yTop],
      [x0 + t - (yBottom - y0), yBottom],
    ]);
  }
  return out;
}
