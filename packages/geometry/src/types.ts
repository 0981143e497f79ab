/**
 * Plain readonly data of the geometry layer. Lengths in mm, angles in radians
 * unless a name says `Deg`.
 */
import type { Vec3 } from './vec3.js';

/** An infinite straight line `origin + t * direction`; `direction` is a unit vector. */
export interface Line3 {
  readonly origin: Vec3;
  readonly direction: Vec3;
}

export type { CylinderSurface } from './surfaces/cylinder.js';
export type { PlaneSurface } from './surfaces/plane.js';
export type { ConeSurface } from './surfaces/cone.js';
export type { HostSurface, HostKind } from './surfaces/table.js';

/**
 * The cut pipe as a bundle of generator lines: its axis, the radius of the
 * surface that meets the host, and the frame that fixes station angle phi.
 *
 * A generator at angle phi is the line through
 * `axisPoint + radius * (cos phi * heelDirection + sin phi * sideDirection)`
 * parallel to `axisDirection`. `axisDirection` points from the pipe's body
 * toward the host (the way the cut end faces).
 */
export interface GeneratorBundle {
  readonly radius: number;
  readonly axisPoint: Vec3;
  readonly axisDirection: Vec3;
  /** Unit vector square to the axis toward phi = 0 (the heel). */
  readonly heelDirection: Vec3;
  /** Unit vector square to the axis toward phi = 90°: `axisDirection × heelDirection` or its opposite, as the joint defines. */
  readonly sideDirection: Vec3;
}
