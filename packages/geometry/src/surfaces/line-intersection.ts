/**
 * Where a straight line meets a host surface, the host offset, its normal and
 * its development, each looked up by kind in the surface table.
 */
import { GirthError } from '@girth/pipes';
import { TANGENCY_REL_EPS } from '../tolerances.js';
import type { Line3 } from '../types.js';
import type { Vec3 } from '../vec3.js';
import { surfaceOpsFor, type HostSurface, type SurfaceTableOption } from './table.js';
import type { FlatPoint, HostShape, LineRoot } from './types.js';

/** Options of the line–surface functions: a tangency tolerance and the surface table. */
export interface LineSurfaceOptions<S extends HostShape = HostSurface> extends SurfaceTableOption<S> {
  /** Relative tangency tolerance, see {@link TANGENCY_REL_EPS} (the default). */
  readonly eps?: number;
}

/**
 * Every place where `line` meets `surface`, ascending, each flagged when the
 * line only touches the surface there.
 *
 * @throws GirthError `BAD_OPTION` (field `host`) for a kind missing from the table.
 * @example
 * lineRoots({ kind: 'cylinder', radius: 1, axisPoint: [0,0,0], axisDirection: [1,0,0] },
 *           { origin: [0,1,5], direction: [0,0,-1] }) // [{ tMm: 5, tangent: true }]
 */
export function lineRoots<S extends HostShape = HostSurface>(surface: S, line: Line3, options: LineSurfaceOptions<S> = {}): readonly LineRoot[] {
  return surfaceOpsFor(surface, options.surfaces).intersectLine(surface, line, options.eps ?? TANGENCY_REL_EPS);
}

/**
 * The line parameters `t` (mm along the unit direction) at which `line` meets
 * `surface`, ascending. A grazing (tangent) line gives its root twice;
 * a line that misses gives an empty array. See {@link lineRoots} for the
 * roots with their tangency flags.
 *
 * @param options.eps relative tolerance for tangency, see {@link TANGENCY_REL_EPS}.
 * @throws GirthError `BAD_OPTION` (field `host`) for a kind missing from the table.
 * @example
 * intersectLine({ kind: 'plane', point: [0,0,0], normal: [0,0,1] },
 *               { origin: [0,0,10], direction: [0,0,-1] }) // [10]
 */
export function intersectLine<S extends HostShape = HostSurface>(surface: S, line: Line3, options: LineSurfaceOptions<S> = {}): readonly number[] {
  const out: number[] = [];
  for (const r of lineRoots(surface, line, options)) {
    out.push(r.tMm);
    if (r.tangent) out.push(r.tMm);
  }
  return out;
}

/**
 * The host surface moved by `distanceMm` along its outward normal (toward the
 * side the cut pipe comes from). Used for a root gap: the cut that leaves a gap
 * g normal to the host is the cut to the host offset by g.
 *
 * @throws GirthError `OUT_OF_RANGE` (field `gap`) if no surface is left (a
 *   cylinder offset to a radius ≤ 0); `BAD_OPTION` (field `host`) for a kind
 *   missing from the table.
 * @example offsetSurface({ kind: 'cylinder', radius: 100, axisPoint: [0,0,0], axisDirection: [1,0,0] }, 3).radius // 103
 */
export function offsetSurface<S extends HostShape = HostSurface>(surface: S, distanceMm: number, options: SurfaceTableOption<S> = {}): S {
  return surfaceOpsFor(surface, options.surfaces).offset(surface, distanceMm);
}

/**
 * Unit normal of the host at a point on it (mm), pointing outward (away from a
 * cylinder's axis; along a plane's normal).
 * @throws GirthError `BAD_OPTION` (field `host`) for a kind missing from the table.
 * @example surfaceNormal({ kind: 'plane', point: [0,0,0], normal: [0,0,1] }, [5,5,0]) // [0,0,1]
 */
export function surfaceNormal<S extends HostShape = HostSurface>(surface: S, point: Vec3, options: SurfaceTableOption<S> = {}): Vec3 {
  return surfaceOpsFor(surface, options.surfaces).normal(surface, point);
}

/**
 * Where `point` (on `surface`, mm) lands when the surface is rolled out flat,
 * `[u, v]` mm in the surface's own flat frame (a cylinder: girth from its
 * zero-girth generator, axial from its axis point; a cone: its flat pattern
 * with the apex at the origin).
 * @throws GirthError `BAD_OPTION` (field `host`) when the kind is missing
 *   from the table or does not develop (a plane, a sphere).
 * @example developPoint(header, hit.point) // [girth, axial]
 */
export function developPoint<S extends HostShape = HostSurface>(surface: S, point: Vec3, options: SurfaceTableOption<S> = {}): FlatPoint {
  const ops = surfaceOpsFor(surface, options.surfaces);
  if (ops.develop === undefined) throw notDevelopable(surface);
  return ops.develop(surface, point);
}

/**
 * The inverse of {@link developPoint}: the point on `surface` (mm) that lands at `flat`.
 * @throws GirthError `BAD_OPTION` (field `host`) when the kind is missing or cannot be developed back.
 * @example undevelopPoint(header, [0, 25]) // the top line, 25 mm along the axis
 */
export function undevelopPoint<S extends HostShape = HostSurface>(surface: S, flat: FlatPoint, options: SurfaceTableOption<S> = {}): Vec3 {
  const ops = surfaceOpsFor(surface, options.surfaces);
  if (ops.undevelop === undefined) throw notDevelopable(surface);
  return ops.undevelop(surface, flat);
}

function notDevelopable(surface: HostShape): Error {
  return new GirthError('BAD_OPTION', 'host', `host: a surface of kind '${surface.kind}' does not roll out flat`, surface.kind);
}
