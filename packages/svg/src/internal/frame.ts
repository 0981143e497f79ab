/**
 * Where the template's y-up millimetres land on the y-down paper.
 */
import type { Point2 } from '@girth/unroll';

/** Maps template coordinates (mm, y-up) to paper coordinates (mm, y-down, origin top left). */
export interface Frame {
  /** Paper x of template x, mm. */
  readonly x: (x: number) => number;
  /** Paper y of template y, mm (flipped). */
  readonly y: (y: number) => number;
}

/**
 * The frame that puts template point (`minX`, `maxY`) at paper point (`left`, `top`).
 *
 * @example frameAt(0, 50, 10, 10).y(50) // 10
 */
export function frameAt(minX: number, maxY: number, left: number, top: number): Frame {
  return { x: (x) => left + (x - minX), y: (y) => top + (maxY - y) };
}

/** A template point on the paper, mm. */
export function onPaper(frame: Frame, p: Point2): [number, number] {
  return [frame.x(p[0]), frame.y(p[1])];
}
