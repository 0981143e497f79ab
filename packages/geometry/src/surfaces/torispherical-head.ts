/**
 * Host kind `torispherical-head`: a dished head of a spherical crown and a
 * toroidal knuckle (flanged and dished), with its straight flange, and any
 * surface parallel to it.
 */
import { headOps, type HeadProfile, type HeadSurfaceBase } from './head-of-revolution.js';
import type { SurfaceOps } from './types.js';

/**
 * A torispherical head: on its profile (the inside) a spherical crown of
 * radius `crownRadiusMm` meeting, tangent, a knuckle of radius
 * `knuckleRadiusMm` that turns down into the straight flange and shell of
 * radius `radiusMm` (half the ID). The surface is the profile moved out by
 * `offsetMm` (crown and knuckle radii grow by it, centres stay). Needs
 * 0 < knuckle < radius ≤ crown. Outside is away from the vessel. Lengths in mm.
 */
export interface TorisphericalHeadSurface extends HeadSurfaceBase {
  readonly kind: 'torispherical-head';
  /** Inside radius of the flange and shell, mm (half the ID). */
  readonly radiusMm: number;
  /** Inside crown radius, mm. */
  readonly crownRadiusMm: number;
  /** Inside knuckle radius, mm. */
  readonly knuckleRadiusMm: number;
}

/** Where the crown's centre and the crown-knuckle tangent point lie on a torispherical profile. */
export interface TorisphericalShape {
  /** Height of the crown's centre above the tangent line, mm (negative: below it). */
  readonly crownCentreZMm: number;
  /** Angle of the crown-knuckle tangent point's normal from the axis, radians. */
  readonly junctionAngleRad: number;
  /** The crown-knuckle tangent point on the profile: [rho, z], mm. */
  readonly junction: readonly [number, number];
  /** Depth of the dish on the profile, tangent line to crown, mm. */
  readonly depthMm: number;
}

/**
 * The crown centre, the crown-knuckle tangent point and the depth of a
 * torispherical profile. The knuckle's centre is at rho = radius − knuckle on
 * the tangent line; the crown's centre is on the axis at the distance
 * crown − knuckle from it, so the two arcs share their normal where they meet.
 * @example torisphericalShape({ radiusMm: 500, crownRadiusMm: 1000, knuckleRadiusMm: 60 }).depthMm // ≈ 169.4
 */
export function torisphericalShape(s: Pick<TorisphericalHeadSurface, 'radiusMm' | 'crownRadiusMm' | 'knuckleRadiusMm'>): TorisphericalShape {
  const L = s.crownRadiusMm;
  const r = s.knuckleRadiusMm;
  const k = s.radiusMm - r; // knuckle centre's rho
  const zc = -Math.sqrt(Math.max(0, (L - r) ** 2 - k * k));
  const ur = k / (L - r);
  const uz = -zc / (L - r);
  return {
    crownCentreZMm: zc,
    junctionAngleRad: Math.atan2(ur, uz),
    junction: [L * ur, zc + L * uz],
    depthMm: zc + L,
  };
}

const profile: HeadProfile<TorisphericalHeadSurface> = {
  distance(s, rho, z) {
    if (z < 0) return { distanceMm: rho - s.radiusMm, normalRho: 1, normalZ: 0 };
    const L = s.crownRadiusMm;
    const r = s.knuckleRadiusMm;
    const k = s.radiusMm - r;
    const { crownCentreZMm: zc } = torisphericalShape(s);
    // In the crown's wedge when on the axis side of the line from the crown centre through the knuckle centre.
    if (rho * -zc - (z - zc) * k <= 0) {
      const h = Math.hypot(rho, z - zc);
      if (!(h > 0)) return { distanceMm: -L, normalRho: 0, normalZ: 1 };
      return { distanceMm: h - L, normalRho: rho / h, normalZ: (z - zc) / h };
    }
    const h = Math.hypot(rho - k, z);
    return { distanceMm: h - r, normalRho: (rho - k) / h, normalZ: z / h };
  },
  radiusMm: (s) => s.radiusMm,
  depthMm: (s) => torisphericalShape(s).depthMm,
  minCurvatureRadiusMm: (s) => s.knuckleRadiusMm,
  meridianMm(s, rho, z) {
    const L = s.crownRadiusMm + s.offsetMm;
    const r = s.knuckleRadiusMm + s.offsetMm;
    const k = s.radiusMm - s.knuckleRadiusMm;
    const shape = torisphericalShape(s);
    const zc = shape.crownCentreZMm;
    const psiJ = shape.junctionAngleRad;
    if (z < 0) return L * psiJ + r * (Math.PI / 2 - psiJ) - z;
    if (rho * -zc - (z - zc) * k <= 0) return L * Math.atan2(rho, z - zc);
    return L * psiJ + r * (Math.atan2(rho - k, z) - psiJ);
  },
};

/** The profile operations of a torispherical head (signed distance, radii, meridian length), for the head functions. */
export const torisphericalHeadProfile = profile;

/**
 * The operations of host kind `torispherical-head` (see `headOps`): line
 * intersection, offset, normal. Crown and knuckle do not develop.
 * @example torisphericalHeadOps.offset(inside, 9.5).offsetMm // 9.5
 */
export const torisphericalHeadOps: SurfaceOps<TorisphericalHeadSurface> = headOps(profile);
