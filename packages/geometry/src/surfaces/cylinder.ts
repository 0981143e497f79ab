/**
 * Host kind `cylinder`: a right circular cylinder (a header, a pipe's OD or
 * ID). Line intersection in closed form, offset, normal, development and the
 * grazing generators of a bundle.
 */
import { GirthError } from '@girth/pipes';
import { addScaled, cross, dot, sub, type Vec3 } from '../vec3.js';
import type { GeneratorBundle, Line3 } from '../types.js';
import type { FlatPoint, LineRoot, SurfaceOps } from './types.js';

/**
 * A right circular cylinder (infinite), as the host a pipe is cut to meet.
 * `axisDirection` is a unit vector. Outside is away from the axis.
 */
export interface CylinderSurface {
  readonly kind: 'cylinder';
  /** Radius, mm, > 0. */
  readonly radius: number;
  /** A point on the axis, mm; the development measures along the axis from here. */
  readonly axisPoint: Vec3;
  readonly axisDirection: Vec3;
  /**
   * Unit vector square to the axis toward the generator from which girth is
   * measured on the development (a header's top line). When left out: the
   * part of +z square to the axis, or +x when the axis lies along z.
   */
  readonly zeroGirthDirection?: Vec3;
}

/** Slack on |sin phi| ≤ 1 for a bundle whose side is flush with the cylinder and whose sizes carry rounding (relative). */
const SIN_SLACK = 1e-12;

const TWO_PI = 2 * Math.PI;

function intersectLine(cyl: CylinderSurface, line: Line3, eps: number): readonly LineRoot[] {
  // Remove the axial components; solve |w0 + t w1|² = R² in the plane square to the axis.
  // Written out in scalars (this runs for every generator sampled): the same
  // operations, in the same order, as w0 = rel − (rel·a) a and w1 = d − (d·a) a.
  const a = cyl.axisDirection;
  const o = line.origin;
  const p = cyl.axisPoint;
  const d = line.direction;
  const r0 = o[0] - p[0];
  const r1 = o[1] - p[1];
  const r2 = o[2] - p[2];
  const ka = -(r0 * a[0] + r1 * a[1] + r2 * a[2]);
  const w00 = r0 + a[0] * ka;
  const w01 = r1 + a[1] * ka;
  const w02 = r2 + a[2] * ka;
  const kd = -(d[0] * a[0] + d[1] * a[1] + d[2] * a[2]);
  const w10 = d[0] + a[0] * kd;
  const w11 = d[1] + a[1] * kd;
  const w12 = d[2] + a[2] * kd;
  const qa = w10 * w10 + w11 * w11 + w12 * w12;
  if (qa === 0) return []; // parallel to the axis: inside or outside forever
  const qb = w00 * w10 + w01 * w11 + w02 * w12; // half of the linear coefficient
  const qc = w00 * w00 + w01 * w01 + w02 * w02 - cyl.radius * cyl.radius;
  const disc = qb * qb - qa * qc;
  // Tangency relative to qa R²: a discriminant within eps of it is a graze within about sqrt(eps) R.
  const scaleSq = qa * cyl.radius * cyl.radius;
  if (disc < -eps * scaleSq) return [];
  if (disc <= eps * scaleSq) return [{ tMm: -qb / qa, tangent: true }];
  const root = Math.sqrt(disc);
  // Numerically stable pair (no cancellation).
  const q = qb >= 0 ? -(qb + root) : -(qb - root);
  const t1 = q / qa;
  const t2 = qc / q;
  return t1 <= t2
    ? [{ tMm: t1, tangent: false }, { tMm: t2, tangent: false }]
    : [{ tMm: t2, tangent: false }, { tMm: t1, tangent: false }];
}

function offset(cyl: CylinderSurface, distanceMm: number): CylinderSurface {
  const radius = cyl.radius + distanceMm;
  if (!(radius > 0)) {
    throw new GirthError('OUT_OF_RANGE', 'gap', `gap: an offset of ${distanceMm} mm leaves no surface of radius ${cyl.radius} mm`, distanceMm);
  }
  return { ...cyl, radius };
}

function normal(cyl: CylinderSurface, point: Vec3): Vec3 {
  const rel = sub(point, cyl.axisPoint);
  const radial = addScaled(rel, cyl.axisDirection, -dot(rel, cyl.axisDirection));
  const n = Math.hypot(radial[0], radial[1], radial[2]);
  return [radial[0] / n, radial[1] / n, radial[2] / n];
}

/** The zero-girth direction of `cyl`, given or by the default rule. */
function zeroGirth(cyl: CylinderSurface): Vec3 {
  if (cyl.zeroGirthDirection !== undefined) return cyl.zeroGirthDirection;
  const a = cyl.axisDirection;
  const ref: Vec3 = Math.abs(a[2]) < 1 - 1e-12 ? [0, 0, 1] : [1, 0, 0];
  const v = addScaled(ref, a, -dot(ref, a));
  const n = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / n, v[1] / n, v[2] / n];
}

/**
 * Development: u = girth = R · (angle around the axis from the zero-girth
 * generator, in (−π, π], growing toward zeroGirthDirection × axisDirection),
 * v = distance along the axis from `axisPoint`.
 */
function develop(cyl: CylinderSurface, point: Vec3): FlatPoint {
  // side = zero × axis, rel = point − axisPoint, in scalars (same operations as cross, sub, dot).
  const z = zeroGirth(cyl);
  const a = cyl.axisDirection;
  const s0 = z[1] * a[2] - z[2] * a[1];
  const s1 = z[2] * a[0] - z[0] * a[2];
  const s2 = z[0] * a[1] - z[1] * a[0];
  const r0 = point[0] - cyl.axisPoint[0];
  const r1 = point[1] - cyl.axisPoint[1];
  const r2 = point[2] - cyl.axisPoint[2];
  return [cyl.radius * Math.atan2(r0 * s0 + r1 * s1 + r2 * s2, r0 * z[0] + r1 * z[1] + r2 * z[2]), r0 * a[0] + r1 * a[1] + r2 * a[2]];
}

function undevelop(cyl: CylinderSurface, flat: FlatPoint): Vec3 {
  const zero = zeroGirth(cyl);
  const side = cross(zero, cyl.axisDirection);
  const angle = flat[0] / cyl.radius;
  const onAxis = addScaled(cyl.axisPoint, cyl.axisDirection, flat[1]);
  return addScaled(addScaled(onAxis, zero, cyl.radius * Math.cos(angle)), side, cyl.radius * Math.sin(angle));
}

/**
 * Grazes in closed form. Every generator runs along the bundle's axis d; a
 * line along d touches the cylinder exactly when its distance from the
 * cylinder's axis a is R. Measured along m = (a × d) / |a × d|, that distance
 * is c0 + r (cos phi · h·m + sin phi · s·m), with c0 the bundle axis point's
 * part along m. So the grazes solve ρ sin(phi + β) = ±R − c0 with
 * ρ = hypot(h·m, s·m), β = atan2(h·m, s·m). None when d runs along a.
 */
function grazingPhisRad(cyl: CylinderSurface, bundle: GeneratorBundle): readonly number[] {
  const axm = cross(cyl.axisDirection, bundle.axisDirection);
  const len = Math.hypot(axm[0], axm[1], axm[2]);
  if (!(len > 0)) return [];
  const m: Vec3 = [axm[0] / len, axm[1] / len, axm[2] / len];
  const c0 = dot(sub(bundle.axisPoint, cyl.axisPoint), m);
  const hm = dot(bundle.heelDirection, m);
  const sm = dot(bundle.sideDirection, m);
  const rho = Math.hypot(hm, sm) * bundle.radius;
  if (!(rho > 0)) return [];
  const beta = Math.atan2(hm, sm);
  const out: number[] = [];
  for (const side of [1, -1]) {
    const s = (side * cyl.radius - c0) / rho;
    if (Math.abs(s) > 1 + SIN_SLACK) continue;
    const first = Math.asin(Math.max(-1, Math.min(1, s)));
    for (const psi of [first, Math.PI - first]) {
      const phi = psi - beta;
      const p = phi < 0 ? phi + TWO_PI : phi >= TWO_PI ? phi - TWO_PI : phi;
      if (!out.some((q) => Math.abs(q - p) < 1e-12)) out.push(p);
    }
  }
  return out.sort((x, y) => x - y);
}

/**
 * The operations of host kind `cylinder`: closed-form line intersection
 * (tangency relative to the squared radius), offset (radius plus distance),
 * outward normal, development (girth from the zero-girth generator, axial
 * from `axisPoint`) and its inverse, and the grazing generators of a bundle in
 * closed form (for any axis directions, not only a header along x).
 * @example cylinderOps.offset({ kind: 'cylinder', radius: 100, axisPoint: [0,0,0], axisDirection: [1,0,0] }, 3).radius // 103
 */
export const cylinderOps: SurfaceOps<CylinderSurface> = {
  intersectLine,
  offset,
  normal,
  develop,
  undevelop,
  grazingPhisRad,
};
