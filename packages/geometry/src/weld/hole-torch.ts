/**
 * How the torch is held to cut a branch hole in the header: parallel to the
 * branch axis, so the hole's wall continues the branch bore.
 */
import { GirthError } from '@girth/pipes';
import type { BranchGeometry } from '../branch/types.js';
import { hitGenerator } from '../generators.js';
import { surfaceNormal } from '../surfaces/line-intersection.js';
import type { CylinderSurface } from '../types.js';
import { dot, type Vec3 } from '../vec3.js';

const DEG = 180 / Math.PI;

/** The torch at one station of the header hole. Angles in degrees. */
export interface HoleTorchAtStation {
  /** The station's point on the hole outline on the header OD, mm. */
  readonly point: Vec3;
  /** Angle between the torch (held parallel to the branch axis) and the header's radial direction there, degrees in [0, 90]. */
  readonly tiltDeg: number;
  /**
   * The tilt seen along the header: how far the torch's upper end leans from
   * the radial toward +x (the toe end of a lateral's header), degrees, signed,
   * in the plane of the header axis and the radial.
   */
  readonly leanAlongHeaderDeg: number;
  /**
   * The tilt seen around the header: how far the torch's upper end leans from
   * the radial toward +y (the way girth grows on the hole template), degrees,
   * signed, in the plane square to the header axis.
   */
  readonly leanAroundHeaderDeg: number;
}

/**
 * The torch for the header hole at station angle `phiRad`: held parallel to
 * the branch axis (so the hole meets the branch bore, common practice for a
 * set-on branch), its tilt from the header's radial direction at the
 * station's point on the header OD, whole and split along and around the
 * header.
 *
 * @throws GirthError `NO_INTERSECTION` (field `stations`) when the hole
 *   generator misses the header OD (a solved branch never has one).
 * @example holeTorchAtStation(solveBranch(tee), 0).tiltDeg // 0 at the crown of a tee
 */
export function holeTorchAtStation(geometry: BranchGeometry, phiRad: number): HoleTorchAtStation {
  const hit = hitGenerator(geometry.holeBundle, geometry.holeHost, phiRad);
  if (hit === undefined) {
    throw new GirthError('NO_INTERSECTION', 'stations', `stations: the hole generator at ${(phiRad * DEG).toFixed(3)}° misses the header OD`, phiRad);
  }
  const n = surfaceNormal(geometry.holeHost, hit.point);
  const b = geometry.branchAxisDirection;
  const radial = dot(b, n);
  // Around the header: the unit tangent toward +y at the point, (0, z, −y) / |(y, z)|.
  const around: Vec3 = [0, n[2], -n[1]];
  return {
    point: hit.point,
    tiltDeg: Math.acos(Math.max(-1, Math.min(1, radial))) * DEG,
    leanAlongHeaderDeg: Math.atan2(b[0], radial) * DEG,
    leanAroundHeaderDeg: Math.atan2(dot(b, around), radial) * DEG,
  };
}

/**
 * The header's inside surface (the bore), as a host, for the hole's outline
 * on the ID.
 * @example headerIdSurface(solveBranch(spec)).radius // header ID / 2
 */
export function headerIdSurface(geometry: BranchGeometry): CylinderSurface {
  return { kind: 'cylinder', radius: geometry.spec.header.idMm / 2, axisPoint: [0, 0, 0], axisDirection: [1, 0, 0] };
}
