/**
 * Axis-aligned boxes in mm, and the boxes of the parts of a template (y-up).
 */
import makerjs from 'makerjs';
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
 * The box of a path part, mm; an arc's box includes the quadrant points it passes (measured by makerjs).
 *
 * @example partBox({ kind: 'arc', center: [0, 0], radiusMm: 10, startDeg: 0, endDeg: 180 }) // { minX: -10, minY: 0, maxX: 10, maxY: 10 }
 */
export function partBox(part: PathPart): Box {
  switch (part.kind) {
    case 'polyline':
      return pointsBox(part.points);
    case 'segment':
      return pointsBox([part.from, part.to]);
    case 'arc': {
      const full = arcSweepDeg(part.startDeg, part.endDeg) === 360;
      const path = new makerjs.paths.Arc(
        [part.center[0], part.center[1]],
        part.radiusMm,
        full ? 0 : part.startDeg,
        full ? 360 : part.endDeg,
      );
      const m = makerjs.measure.pathExtents(path);
      const [minX, minY] = m.low as [number, number];
      const [maxX, maxY] = m.high as [number, number];
      return { minX, minY, maxX, maxY };
    }
  }
}
