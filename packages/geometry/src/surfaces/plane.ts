/**
 * Host kind `plane`: a flat weld plane (a miter joint, a cut-back).
 */
import { addScaled, dot, sub, type Vec3 } from '../vec3.js';
import type { Line3 } from '../types.js';
import type { LineRoot, SurfaceOps } from './types.js';

/**
 * A plane through `point` with unit `normal`. The normal points to the side the
 * cut pipe comes from (the "outside" of the host).
 */
export interface PlaneSurface {
  readonly kind: 'plane';
  readonly point: Vec3;
  readonly normal: Vec3;
}

function intersectLine(plane: PlaneSurface, line: Line3): readonly LineRoot[] {
  const denom = dot(plane.normal, line.direction);
  if (denom === 0) return [];
  return [{ tMm: dot(plane.normal, sub(plane.point, line.origin)) / denom, tangent: false }];
}

/**
 * The operations of host kind `plane`: line intersection (one root, never
 * tangent; a line in or parallel to the plane misses), offset along the
 * normal, and the constant normal. A plane needs no development of its own
 * here, and a straight line never grazes it.
 * @example planeOps.intersectLine({ kind: 'plane', point: [0,0,0], normal: [0,0,1] }, { origin: [0,0,10], direction: [0,0,-1] }, 0)[0]?.tMm // 10
 */
export const planeOps: SurfaceOps<PlaneSurface> = {
  intersectLine,
  offset: (plane, distanceMm) => ({ ...plane, point: addScaled(plane.point, plane.normal, distanceMm) }),
  normal: (plane) => plane.normal,
  grazingPhisRad: () => [],
};
