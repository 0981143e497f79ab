/**
 * Placing a flat pattern on the plate: turn it so a chosen element stands
 * upright (large end up), then move it so its bounding rectangle starts at
 * (0, 0).
 */
import type { Point2 } from '../../types.js';

/** A rigid motion of the flat: rotate about the origin by the angle whose cosine and sine are given (counter-clockwise), then shift by (dx, dy) mm. */
export interface PlaneMotion {
  readonly cos: number;
  readonly sin: number;
  readonly dx: number;
  readonly dy: number;
}

/** Axis-aligned bounds, mm. */
export interface Bounds2 {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/**
 * `p` moved by `m`.
 * @example movePoint([1, 0], { cos: 0, sin: 1, dx: 0, dy: 0 }) // [0, 1]
 */
export function movePoint(p: Point2, m: PlaneMotion): Point2 {
  return [m.cos * p[0] - m.sin * p[1] + m.dx, m.sin * p[0] + m.cos * p[1] + m.dy];
}

/**
 * The rotation that turns the direction `from`→`to` to point straight up (+y).
 * @example uprightRotation([0, 0], [1, 0]) // a quarter turn counter-clockwise
 */
export function uprightRotation(from: Point2, to: Point2): PlaneMotion {
  const angle = Math.PI / 2 - Math.atan2(to[1] - from[1], to[0] - from[0]);
  return { cos: Math.cos(angle), sin: Math.sin(angle), dx: 0, dy: 0 };
}

/**
 * `m` followed by a shift that brings `bounds` (already in the moved frame) to start at (0, 0).
 * @example toPlateOrigin(m, { minX: -3, minY: 2, maxX: 0, maxY: 5 }).dx // m.dx + 3
 */
export function toPlateOrigin(m: PlaneMotion, bounds: Bounds2): PlaneMotion {
  return { ...m, dx: m.dx - bounds.minX, dy: m.dy - bounds.minY };
}

/**
 * Bounds of a set of points (at least one).
 * @example boundsOfPoints([[0, 1], [2, -1]]) // { minX: 0, minY: -1, maxX: 2, maxY: 1 }
 */
export function boundsOfPoints(points: readonly Point2[]): Bounds2 {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    if (p[0] < minX) minX = p[0];
    if (p[0] > maxX) maxX = p[0];
    if (p[1] < minY) minY = p[1];
    if (p[1] > maxY) maxY = p[1];
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The points that bound a circular arc from `startDeg` to `endDeg`
 * (counter-clockwise, end ≥ start): its two ends and every quadrant point
 * (0°, 90°, 180°, 270°, ...) it passes.
 * @example arcExtremePoints([0, 0], 1, 45, 135) // ends at 45° and 135°, and [0, 1]
 */
export function arcExtremePoints(center: Point2, radiusMm: number, startDeg: number, endDeg: number): readonly Point2[] {
  const at = (deg: number): Point2 => {
    const t = (deg * Math.PI) / 180;
    return [center[0] + radiusMm * Math.cos(t), center[1] + radiusMm * Math.sin(t)];
  };
  const points: Point2[] = [at(startDeg), at(endDeg)];
  for (let q = Math.ceil(startDeg / 90) * 90; q < endDeg; q += 90) {
    if (q > startDeg) points.push(quadrantPoint(center, radiusMm, q));
  }
  return points;
}

function quadrantPoint(center: Point2, r: number, deg: number): Point2 {
  const k = ((Math.round(deg / 90) % 4) + 4) % 4;
  const dir: readonly Point2[] = [[1, 0], [0, 1], [-1, 0], [0, -1]];
  const d = dir[k] as Point2;
  return [center[0] + r * d[0], center[1] + r * d[1]];
}
