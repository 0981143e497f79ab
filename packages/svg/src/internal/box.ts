/**
 * Axis-aligned boxes in mm, and the boxes of the parts of a template (y-up).
 */
import type { PathPart, Point2 } from '@girth/unroll';
import { arcSweepDeg } from '../check-template.js';

/** An axis-aligned box, mm. Empty when `minX > maxX`. */
export interface Box {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** The empty box: the identity of {@link unionBox}. */
export const EMPTY_BOX: Box = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };

/** True when the box holds no point. */
export function isEmptyBox(b: Box): boolean {
  return b.minX > b.maxX || b.minY > b.maxY;
}

/**
 * The smallest box holding both.
 *
 * @example unionBox(EMPTY_BOX, b) // b
 */
export function unionBox(a: Box, b: Box): Box {
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  };
}

/** The box grown by `d` mm on every side. */
export function growBox(b: Box, d: number): Box {
  return { minX: b.minX - d, minY: b.minY - d, maxX: b.maxX + d, maxY: b.maxY + d };
}

/** The box of a list of points. */
export function pointsBox(points: readonly Point2[]): Box {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The box of a path part, mm. An arc (counter-clockwise from `startDeg` to
 * `endDeg`, y-up) spans its two end points and every quadrant point (0°, 90°,
 * 180°, 270°) its sweep passes; a sweep of 360° or more is the full circle.
 *
 * @example partBox({ kind: 'arc', center: [0, 0], radiusMm: 10, startDeg: 0, endDeg: 180 }) // { minX: -10, minY: 0, maxX: 10, maxY: 10 }
 */
export function partBox(part: PathPart): Box {
  switch (part.kind) {
    case 'polyline':
      return pointsBox(part.points);
    case 'segment':
      return pointsBox([part.from, part.to]);
    case 'arc':
      return pointsBox(arcExtremePoints(part.center, part.radiusMm, part.startDeg, part.endDeg));
  }
}

/** The end points of an arc and the quadrant points its sweep passes. */
function arcExtremePoints(center: Point2, radiusMm: number, startDeg: number, endDeg: number): Point2[] {
  const sweepDeg = arcSweepDeg(startDeg, endDeg);
  const at = (deg: number): Point2 => {
    const rad = (deg * Math.PI) / 180;
    return [center[0] + radiusMm * Math.cos(rad), center[1] + radiusMm * Math.sin(rad)];
  };
  const points: Point2[] = [at(startDeg), at(startDeg + sweepDeg)];
  for (const quadrantDeg of [0, 90, 180, 270]) {
    const fromStartDeg = (((quadrantDeg - startDeg) % 360) + 360) % 360;
    if (fromStartDeg <= sweepDeg) points.push(at(quadrantDeg));
  }
  return points;
}
