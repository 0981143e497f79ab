/**
 * Host kind `hemispherical-head`: a hemispherical vessel head (half a sphere
 * of the shell's diameter) with its straight flange, and any surface parallel
 * to it (inside, outside, a root gap away).
 */
import { headOps, type HeadProfile, type HeadSurfaceBase, type MeridianDistance } from './head-of-revolution.js';
import type { SurfaceOps } from './types.js';

/**
 * A hemispherical head: on its profile (the inside) a half sphere of radius
 * `radiusMm` about the centre of the tangent line, then the straight flange
 * and shell, a cylinder of the same radius. The surface is the profile moved
 * out by `offsetMm` (a sphere of radius `radiusMm + offsetMm`). Outside is
 * away from the vessel. Lengths in mm.
 */
export interface HemisphericalHeadSurface extends HeadSurfaceBase {
  readonly kind: 'hemispherical-head';
  /** Inside radius of the head and shell, mm, > 0 (half the ID). */
  readonly radiusMm: number;
}

const FLANGE: MeridianDistance = { distanceMm: 0, normalRho: 1, normalZ: 0 };

const profile: HeadProfile<HemisphericalHeadSurface> = {
  distance(s, rho, z) {
    if (z < 0) return { ...FLANGE, distanceMm: rho - s.radiusMm };
    const h = Math.hypot(rho, z);
    if (!(h > 0)) return { distanceMm: -s.radiusMm, normalRho: 0, normalZ: 1 };
    return { distanceMm: h - s.radiusMm, normalRho: rho / h, normalZ: z / h };
  },
  radiusMm: (s) => s.radiusMm,
  depthMm: (s) => s.radiusMm,
  minCurvatureRadiusMm: (s) => s.radiusMm,
  meridianMm(s, rho, z) {
    const r = s.radiusMm + s.offsetMm;
    return z < 0 ? (r * Math.PI) / 2 - z : r * Math.atan2(rho, z);
  },
};

/** The profile operations of a hemispherical head (signed distance, radii, meridian length), for the head functions. */
export const hemisphericalHeadProfile = profile;

/**
 * The operations of host kind `hemispherical-head` (see `headOps`): line
 * intersection, offset, normal. A sphere does not develop.
 * @example hemisphericalHeadOps.normal(head, [0, 0, 500]) // [0, 0, 1] for a head about +z at the origin
 */
export const hemisphericalHeadOps: SurfaceOps<HemisphericalHeadSurface> = headOps(profile);
