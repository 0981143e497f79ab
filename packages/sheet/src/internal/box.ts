/**
 * Axis-aligned boxes in mm, and the boxes of the parts of a template (y-up).
 * Arc extents are computed here, once, for every writer.
 */
import type { PathPart, Point2 } from '@girth/unroll';
import { arcSweepDeg } from '../check-template.js';

import type { Box } from '../types.js';

export type { Box };

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
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Point2;
    const x = p[0];
    const y = p[1];
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The box of a circular arc, mm: its two ends and every quadrant point (0°, 90°,
 * 180°, 270°) it passes, counter-clockwise from `startDeg` to `endDeg`. A sweep of
 * 360° or more is the whole circle.
 *
 * @example arcBox([0, 0], 10, 0, 180) // { minX: -10, minY: 0, maxX: 10, maxY: 10 }
 */
export function arcBox(center: Point2, radiusMm: number, startDeg: number, endDeg: number): Box {
  const sweep = arcSweepDeg(startDeg, endDeg);
  const [cx, cy] = center;
  if (sweep === 360) return { minX: cx - radiusMm, minY: cy - radiusMm, maxX: cx + radiusMm, maxY: cy + radiusMm };
  const at = (deg: number): Point2 => {
    const a = (deg * Math.PI) / 180;
    return [cx + radiusMm * Math.cos(a), cy + radiusMm * Math.sin(a)];
  };
  const points: Point2[] = [at(startDeg), at(startDeg + sweep)];
  const start = ((startDeg % 360) + 360) % 360;
  // Quadrant angles q with 0 < (q - start) mod 360 < sweep lie inside the arc.
  for (let k = 0; k < 4; k++) {
    const q = 90 * k;
    const offset = (((q - start) % 360) + 360) % 360;
    if (offset > 0 && offset < sweep) {
      // Exactly on the axis, whatever cos/sin round to.
      points.push(k === 0 ? [cx + radiusMm, cy] : k === 1 ? [cx, cy + radiusMm] : k === 2 ? [cx - radiusMm, cy] : [cx, cy - radiusMm]);
    }
  }
  return pointsBox(points);
}

/**
 * The box of a path part, mm; an arc's box includes the quadrant points it passes.
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
      return arcBox(part.center, part.radiusMm, part.startDeg, part.endDeg);
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
