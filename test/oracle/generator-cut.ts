/**
 * Where a straight generator line first meets a host surface, found numerically:
 * the signed distance to the surface is followed along the line, a sign change
 * is bracketed, and bisection closes it to full double precision. No closed
 * form is used, so this oracle shares no algebra with a library that solves the
 * quadratic directly.
 */
import { bisectSignChange, findDipOfConvex } from './root-finding.js';
import { add, cross, dot, norm, scale, sub, type Vec3 } from './vec3.js';

/** A generator: the points `originMm + sMm * direction`; `direction` is a unit vector pointing away from the host (toward the pipe body). */
export interface OracleLine {
  readonly kind: 'line';
  readonly originMm: Vec3;
  readonly direction: Vec3;
}

/** An infinite right circular cylinder: points at `radiusMm` from the axis through `axisPointMm` along unit `axisDirection`. */
export interface OracleCylinder {
  readonly kind: 'cylinder';
  readonly radiusMm: number;
  readonly axisPointMm: Vec3;
  readonly axisDirection: Vec3;
}

/** A plane through `pointMm` with unit `normal`. */
export interface OraclePlane {
  readonly kind: 'plane';
  readonly pointMm: Vec3;
  readonly normal: Vec3;
}

/** Where a generator was cut: its parameter `sMm` along the line and the point, or why it was not. */
export type GeneratorCut =
  | { readonly kind: 'hit'; readonly sMm: number; readonly pointMm: Vec3 }
  | { readonly kind: 'miss'; readonly reason: 'parallel' | 'outside' };

/**
 * A line whose least distance from the surface is within this fraction of the
 * radius (about 45 ulp) grazes it: the oracle reports the touching point rather
 * than a miss decided by rounding. Far below any geometry a test asks about on
 * purpose (the sweeps keep 1e-4 of the radius clear of tangency).
 */
const GRAZE_REL = 1e-14;

/** Lines whose direction is within this sine of the host's axis (or plane) are treated as parallel: the oracle has no cut for them. */
const PARALLEL_SINE = 1e-12;

/**
 * Point of a generator at parameter `sMm`.
 * @example pointOnLine({ kind: 'line', originMm: [0, 0, 0], direction: [0, 0, 1] }, 5) // [0, 0, 5]
 */
export function pointOnLine(line: OracleLine, sMm: number): Vec3 {
  return add(line.originMm, scale(line.direction, sMm));
}

/**
 * Distance of a point from a cylinder's axis (mm).
 * @example distanceFromAxis([0, 3, 4], { kind: 'cylinder', radiusMm: 1, axisPointMm: [0, 0, 0], axisDirection: [1, 0, 0] }) // 5
 */
export function distanceFromAxis(pointMm: Vec3, cylinder: OracleCylinder): number {
  const rel = sub(pointMm, cylinder.axisPointMm);
  return norm(sub(rel, scale(cylinder.axisDirection, dot(rel, cylinder.axisDirection))));
}

/**
 * Signed distance from a cylinder surface: positive outside, negative inside (mm).
 * It is convex along any straight line, which the cut search relies on.
 * @example signedDistanceToCylinder([0, 0, 5], { kind: 'cylinder', radiusMm: 2, axisPointMm: [0, 0, 0], axisDirection: [1, 0, 0] }) // 3
 */
export function signedDistanceToCylinder(pointMm: Vec3, cylinder: OracleCylinder): number {
  return distanceFromAxis(pointMm, cylinder) - cylinder.radiusMm;
}

/**
 * The first point where a generator meets a cylinder, coming in from far out
 * along `+line.direction`: the largest `s` with the point on the surface.
 *
 * Method: widen a symmetric interval until the signed distance is positive at
 * both ends and rising outward (so the closest approach lies inside), find a
 * point inside the cylinder by golden-section search on the convex distance,
 * then bisect between that point and the outer end.
 *
 * @param line the generator, unit direction.
 * @param cylinder the host, unit axis direction, radius > 0 (mm).
 * @returns `hit` with `sMm` and the point (a graze within 1e-14 of the radius counts, at the closest point), or `miss` (`parallel`, or `outside` when the line never enters).
 * @throws Error when the data are not finite.
 * @example
 * cutGeneratorAgainstCylinder(
 *   { kind: 'line', originMm: [0, 0, 0], direction: [0, 0, 1] },
 *   { kind: 'cylinder', radiusMm: 10, axisPointMm: [0, 0, 0], axisDirection: [1, 0, 0] },
 * ) // { kind: 'hit', sMm: 10, pointMm: [0, 0, 10] }
 */
export function cutGeneratorAgainstCylinder(line: OracleLine, cylinder: OracleCylinder): GeneratorCut {
  // The signed distance along the line, with the parts along the axis removed once: for a
  // point origin + s d, the offset from the axis is (o - (o·k)k) + s (d - (d·k)k).
  const k = cylinder.axisDirection;
  const o = sub(line.originMm, cylinder.axisPointMm);
  const oPerp = sub(o, scale(k, dot(o, k)));
  const dPerp = sub(line.direction, scale(k, dot(line.direction, k)));
  const [ox, oy, oz] = oPerp;
  const [dx, dy, dz] = dPerp;
  const radius = cylinder.radiusMm;
  const f = (s: number): number => {
    const x = ox + s * dx;
    const y = oy + s * dy;
    const z = oz + s * dz;
    return Math.sqrt(x * x + y * y + z * z) - radius;
  };
  if (norm(cross(line.direction, cylinder.axisDirection)) < PARALLEL_SINE) return { kind: 'miss', reason: 'parallel' };
  let h = norm(sub(line.originMm, cylinder.axisPointMm)) + cylinder.radiusMm + 1;
  if (!Number.isFinite(h)) throw new Error('cutGeneratorAgainstCylinder: data must be finite');
  for (let i = 0; ; i++) {
    const settled = f(h) > 0 && f(-h) > 0 && f(h) >= f(h / 2) && f(-h) >= f(-h / 2);
    if (settled) break;
    if (i > 80) return { kind: 'miss', reason: 'parallel' };
    h *= 2;
  }
  const dip = findDipOfConvex(f, -h, h);
  if (dip.kind === 'none') {
    if (dip.fMin > GRAZE_REL * radius) return { kind: 'miss', reason: 'outside' };
    return { kind: 'hit', sMm: dip.xMin, pointMm: pointOnLine(line, dip.xMin) };
  }
  const sMm = bisectSignChange(f, dip.x, h);
  return { kind: 'hit', sMm, pointMm: pointOnLine(line, sMm) };
}

/**
 * Where a generator meets a plane (a miter joint or a cut-back to a plane),
 * found the same way: bracket the sign change of the signed distance
 * `(p - point) · normal` along the line and bisect it.
 *
 * @param line the generator, unit direction.
 * @param plane the host plane, unit normal.
 * @returns `hit` with `sMm` and the point, or `miss` with reason `parallel`.
 * @throws Error when the data are not finite.
 * @example
 * cutGeneratorAgainstPlane(
 *   { kind: 'line', originMm: [0, 0, 0], direction: [0, 0, 1] },
 *   { kind: 'plane', pointMm: [0, 0, 7], normal: [0, 0, 1] },
 * ) // { kind: 'hit', sMm: 7, pointMm: [0, 0, 7] }
 */
export function cutGeneratorAgainstPlane(line: OracleLine, plane: OraclePlane): GeneratorCut {
  if (Math.abs(dot(line.direction, plane.normal)) < PARALLEL_SINE) return { kind: 'miss', reason: 'parallel' };
  const raw = (s: number): number => dot(sub(pointOnLine(line, s), plane.pointMm), plane.normal);
  let h = norm(sub(line.originMm, plane.pointMm)) + 1;
  if (!Number.isFinite(h)) throw new Error('cutGeneratorAgainstPlane: data must be finite');
  for (let i = 0; Math.sign(raw(h)) === Math.sign(raw(-h)) || raw(h) === 0; i++) {
    if (i > 80) return { kind: 'miss', reason: 'parallel' };
    h *= 2;
  }
  // Orient so that f > 0 at the far end (+h): the bisection keeps f(lo) <= 0 < f(hi).
  const sign = raw(h) > 0 ? 1 : -1;
  const f = (s: number): number => sign * raw(s);
  const sMm = bisectSignChange(f, -h, h);
  return { kind: 'hit', sMm, pointMm: pointOnLine(line, sMm) };
}
