/**
 * Where a straight line meets a host surface, in closed form.
 */
import { GirthError } from '@girth/pipes';
import { addScaled, dot, sub, type Vec3 } from '../vec3.js';
import { TANGENCY_REL_EPS } from '../tolerances.js';
import type { CylinderSurface, HostSurface, Line3, PlaneSurface } from '../types.js';

/**
 * The line parameters `t` (mm along the unit direction) at which `line` meets
 * `surface`, ascending. A grazing (tangent) line gives one root twice;
 * a line that misses gives an empty array.
 *
 * @param options.eps relative tolerance for tangency, see {@link TANGENCY_REL_EPS}.
 * @example
 * intersectLine({ kind: 'plane', point: [0,0,0], normal: [0,0,1] },
 *               { origin: [0,0,10], direction: [0,0,-1] }) // [10]
 */
export function intersectLine(
  surface: HostSurface,
  line: Line3,
  options: { readonly eps?: number } = {},
): readonly number[] {
  switch (surface.kind) {
    case 'cylinder':
      return intersectCylinder(surface, line, options.eps ?? TANGENCY_REL_EPS);
    case 'plane':
      return intersectPlane(surface, line);
  }
}

function intersectPlane(plane: PlaneSurface, line: Line3): readonly number[] {
  const denom = dot(plane.normal, line.direction);
  if (denom === 0) return [];
  return [dot(plane.normal, sub(plane.point, line.origin)) / denom];
}

function intersectCylinder(cyl: CylinderSurface, line: Line3, eps: number): readonly number[] {
  // Remove the axial components; solve |w0 + t w1|² = R² in the plane square to the axis.
  const a = cyl.axisDirection;
  const rel = sub(line.origin, cyl.axisPoint);
  const w0 = addScaled(rel, a, -dot(rel, a));
  const w1 = addScaled(line.direction, a, -dot(line.direction, a));
  const qa = dot(w1, w1);
  if (qa === 0) return []; // parallel to the axis: inside or outside forever
  const qb = dot(w0, w1); // half of the linear coefficient
  const qc = dot(w0, w0) - cyl.radius * cyl.radius;
  const disc = qb * qb - qa * qc;
  const scaleSq = qa * cyl.radius * cyl.radius;
  if (disc < -eps * scaleSq) return [];
  if (disc <= eps * scaleSq) {
    const t = -qb / qa;
    return [t, t];
  }
  const root = Math.sqrt(disc);
  // Numerically stable pair (no cancellation).
  const q = qb >= 0 ? -(qb + root) : -(qb - root);
  const t1 = q / qa;
  const t2 = qc / q;
  return t1 <= t2 ? [t1, t2] : [t2, t1];
}

/**
 * The host surface moved by `distanceMm` along its outward normal (toward the
 * side the cut pipe comes from). Used for a root gap: the cut that leaves a gap
 * g normal to the host is the cut to the host offset by g.
 *
 * @throws GirthError `OUT_OF_RANGE` if a cylinder would be offset to a radius ≤ 0.
 * @example offsetSurface({ kind: 'cylinder', radius: 100, axisPoint: [0,0,0], axisDirection: [1,0,0] }, 3).radius // 103
 */
export function offsetSurface(surface: HostSurface, distanceMm: number): HostSurface {
  switch (surface.kind) {
    case 'cylinder': {
      const radius = surface.radius + distanceMm;
      if (!(radius > 0)) {
        throw new GirthError('OUT_OF_RANGE', 'gap', `gap: an offset of ${distanceMm} mm leaves no surface of radius ${surface.radius} mm`, distanceMm);
      }
      return { ...surface, radius };
    }
    case 'plane':
      return { ...surface, point: addScaled(surface.point, surface.normal, distanceMm) };
  }
}

/**
 * Unit normal of the host at a point on it, pointing outward (away from a
 * cylinder's axis; along a plane's normal).
 * @example surfaceNormal({ kind: 'plane', point: [0,0,0], normal: [0,0,1] }, [5,5,0]) // [0,0,1]
 */
export function surfaceNormal(surface: HostSurface, point: Vec3): Vec3 {
  switch (surface.kind) {
    case 'plane':
      return surface.normal;
    case 'cylinder': {
      const rel = sub(point, surface.axisPoint);
      const radial = addScaled(rel, surface.axisDirection, -dot(rel, surface.axisDirection));
      const n = Math.hypot(radial[0], radial[1], radial[2]);
      return [radial[0] / n, radial[1] / n, radial[2] / n];
    }
  }
}
