/**
 * Host kind `cone`: one nappe of a right circular cone (the outside of a
 * concentric reducer, extended past its ends). Line intersection in closed
 * form, offset, normal, and the development that is the cone's flat pattern.
 */
import { GirthError } from '@girth/pipes';
import { addScaled, cross, dot, sub, type Vec3 } from '../vec3.js';
import type { Line3 } from '../types.js';
import type { FlatPoint, LineRoot, SurfaceOps } from './types.js';

/**
 * One nappe of a right circular cone: the points p with
 * (p − apex) · axisDirection = |p − apex| cos(halfAngleRad). Outside is away
 * from the axis. Lengths in mm.
 */
export interface ConeSurface {
  readonly kind: 'cone';
  /** The apex, mm. */
  readonly apex: Vec3;
  /** Unit vector along the axis from the apex into the nappe (toward the large end of a reducer). */
  readonly axisDirection: Vec3;
  /** Half-apex angle between the axis and every element, radians in (0, π/2). */
  readonly halfAngleRad: number;
  /**
   * Unit vector square to the axis toward the element from which the
   * development's angle is measured. When left out: the part of +x square to
   * the axis, or +y when the axis lies along x.
   */
  readonly zeroGirthDirection?: Vec3;
}

function intersectLine(cone: ConeSurface, line: Line3, eps: number): readonly LineRoot[] {
  // ((w · u)² − cos²α |w|²) = 0 with w = w0 + t d; keep the roots on the nappe (w · u ≥ 0).
  const u = cone.axisDirection;
  const c2 = Math.cos(cone.halfAngleRad) ** 2;
  const w0 = sub(line.origin, cone.apex);
  const d = line.direction;
  const du = dot(d, u);
  const wu = dot(w0, u);
  const qa = du * du - c2 * dot(d, d);
  const qb = wu * du - c2 * dot(w0, d); // half of the linear coefficient
  const qc = wu * wu - c2 * dot(w0, w0);
  const onNappe = (t: number): boolean => wu + t * du >= 0;
  const roots: LineRoot[] = [];
  if (qa === 0) {
    // Parallel to an element: one root, or none.
    if (qb !== 0) {
      const t = -qc / (2 * qb);
      if (onNappe(t)) roots.push({ tMm: t, tangent: false });
    }
    return roots;
  }
  const disc = qb * qb - qa * qc;
  // Tangency relative to the size of the terms that cancel in the discriminant.
  const scale = Math.max(qb * qb, Math.abs(qa * qc));
  if (disc < -eps * scale) return roots;
  if (disc <= eps * scale) {
    const t = -qb / qa;
    if (onNappe(t)) roots.push({ tMm: t, tangent: true });
    return roots;
  }
  const root = Math.sqrt(disc);
  const q = qb >= 0 ? -(qb + root) : -(qb - root);
  const pair = q === 0 ? [0, 0] : [q / qa, qc / q];
  for (const t of pair.sort((x, y) => x - y)) if (onNappe(t)) roots.push({ tMm: t, tangent: false });
  return roots;
}

function offset(cone: ConeSurface, distanceMm: number): ConeSurface {
  // Moving every element by d along the normal keeps the half angle and moves the apex by −d / sin α along the axis.
  const shift = distanceMm / Math.sin(cone.halfAngleRad);
  if (!Number.isFinite(shift)) {
    throw new GirthError('OUT_OF_RANGE', 'gap', `gap: an offset of ${distanceMm} mm cannot be applied to this cone`, distanceMm);
  }
  return { ...cone, apex: addScaled(cone.apex, cone.axisDirection, -shift) };
}

function normal(cone: ConeSurface, point: Vec3): Vec3 {
  const u = cone.axisDirection;
  const w = sub(point, cone.apex);
  const radial = addScaled(w, u, -dot(w, u));
  const n = Math.hypot(radial[0], radial[1], radial[2]);
  if (!(n > 0)) return [-u[0], -u[1], -u[2]]; // the apex: no tangent plane; the axis back out
  const c = Math.cos(cone.halfAngleRad) / n;
  const s = Math.sin(cone.halfAngleRad);
  return [radial[0] * c - u[0] * s, radial[1] * c - u[1] * s, radial[2] * c - u[2] * s];
}

function frame(cone: ConeSurface): { readonly zero: Vec3; readonly side: Vec3 } {
  const u = cone.axisDirection;
  let zero = cone.zeroGirthDirection;
  if (zero === undefined) {
    const ref: Vec3 = Math.abs(u[0]) < 1 - 1e-12 ? [1, 0, 0] : [0, 1, 0];
    const v = addScaled(ref, u, -dot(ref, u));
    const n = Math.hypot(v[0], v[1], v[2]);
    zero = [v[0] / n, v[1] / n, v[2] / n];
  }
  return { zero, side: cross(zero, u) };
}

/**
 * Development (the flat pattern): the apex at the origin, the zero element
 * along +v. A point at slant distance ℓ from the apex and angle θ around the
 * axis (from the zero element, in (−π, π], growing toward
 * zeroGirthDirection × axisDirection, as on a cylinder) lands at angle ψ = θ sin α from +v
 * toward +u: [ℓ sin ψ, ℓ cos ψ].
 */
function develop(cone: ConeSurface, point: Vec3): FlatPoint {
  const { zero, side } = frame(cone);
  const w = sub(point, cone.apex);
  const ell = Math.hypot(w[0], w[1], w[2]);
  const psi = Math.atan2(dot(w, side), dot(w, zero)) * Math.sin(cone.halfAngleRad);
  return [ell * Math.sin(psi), ell * Math.cos(psi)];
}

function undevelop(cone: ConeSurface, flat: FlatPoint): Vec3 {
  const { zero, side } = frame(cone);
  const ell = Math.hypot(flat[0], flat[1]);
  const theta = Math.atan2(flat[0], flat[1]) / Math.sin(cone.halfAngleRad);
  const along = ell * Math.cos(cone.halfAngleRad);
  const out = ell * Math.sin(cone.halfAngleRad);
  return addScaled(addScaled(addScaled(cone.apex, cone.axisDirection, along), zero, out * Math.cos(theta)), side, out * Math.sin(theta));
}

/**
 * The operations of host kind `cone`: closed-form line intersection on the
 * one nappe (tangency relative to the terms of the discriminant), offset
 * (same half angle, apex moved along the axis by −d / sin α), outward normal,
 * and the development that is the cone's flat pattern (an annular sector for
 * a frustum, sweep 360° sin α) and its inverse. Grazes are found numerically.
 * @example coneOps.develop?.({ kind: 'cone', apex: [0,0,0], axisDirection: [0,0,1], halfAngleRad: Math.PI / 6 }, [1, 0, Math.sqrt(3)]) // [0, 2]
 */
export const coneOps: SurfaceOps<ConeSurface> = {
  intersectLine,
  offset,
  normal,
  develop,
  undevelop,
};
