/**
 * The dished heads as one family: their profiles keyed by kind, and what a
 * layout person measures on a head that does not roll out flat (the length
 * down the meridian from the crown centre, the length around the parallel
 * from the reference meridian).
 */
import type { Vec3 } from '../vec3.js';
import { ellipsoidalHeadProfile, type EllipsoidalHeadSurface } from './ellipsoidal-head.js';
import { headLocal, type HeadProfile, type HeadSurfaceBase } from './head-of-revolution.js';
import { hemisphericalHeadProfile, type HemisphericalHeadSurface } from './hemispherical-head.js';
import { torisphericalHeadProfile, type TorisphericalHeadSurface } from './torispherical-head.js';

/** A dished vessel head with its straight flange: one of the head kinds of the surface table. */
export type HeadSurface = HemisphericalHeadSurface | EllipsoidalHeadSurface | TorisphericalHeadSurface;

const PROFILES: { readonly [K in HeadSurface['kind']]: HeadProfile<Extract<HeadSurface, { readonly kind: K }>> } = {
  'hemispherical-head': hemisphericalHeadProfile,
  'ellipsoidal-head': ellipsoidalHeadProfile,
  'torispherical-head': torisphericalHeadProfile,
};

function profileOf(head: HeadSurface): HeadProfile<HeadSurfaceBase> {
  return PROFILES[head.kind] as unknown as HeadProfile<HeadSurfaceBase>;
}

/**
 * Depth of the dish of `head` on the surface itself (the profile's depth plus
 * the offset), tangent line to crown, mm.
 * @example headDishDepthMm({ kind: 'ellipsoidal-head', radiusMm: 500, depthMm: 250, offsetMm: 10, ... }) // 260
 */
export function headDishDepthMm(head: HeadSurface): number {
  return profileOf(head).depthMm(head) + head.offsetMm;
}

/** Where a point on a head lies, as a layout person measures it with a tape from the crown centre. */
export interface HeadTapePosition {
  /** Length over the surface down the meridian from the crown centre (where the axis meets the surface) to the point's parallel, mm. */
  readonly meridianMm: number;
  /** Length around the point's parallel (the circle about the axis through it) from the reference meridian, mm, signed: positive toward axisDirection × zeroDirection. */
  readonly aroundMm: number;
  /** Radius of the point's parallel, mm. */
  readonly parallelRadiusMm: number;
  /** Height of the point above the tangent line, mm (negative on the straight flange). */
  readonly heightMm: number;
}

/**
 * The tape position of `point` (a point on `head`, mm): the length down the
 * meridian from the crown centre (exact on a sphere or torus arc; on an
 * ellipse the arc integral by 16-point Gauss-Legendre quadrature on 8 panels,
 * exact to rounding) and the length around its parallel from the reference
 * meridian (radius times angle). A meridian is a geodesic of a surface of
 * revolution, so a tape held down it reads `meridianMm`; a parallel is not,
 * so a tape stretched straight between two points of it reads less than
 * `aroundMm` (see {@link parallelTapeShortfallMm}).
 * @example headTapePosition(head, hit.point).meridianMm
 */
export function headTapePosition(head: HeadSurface, point: Vec3): HeadTapePosition {
  const local = headLocal(head, point);
  return {
    meridianMm: profileOf(head).meridianMm(head, local.rhoMm, local.zMm),
    aroundMm: local.rhoMm * local.angleRad,
    parallelRadiusMm: local.rhoMm,
    heightMm: local.zMm,
  };
}

/**
 * How much shorter than the arc along a parallel of radius `radiusMm` a
 * straight line between its ends is, for an arc of `aroundMm`: the most a
 * tape pulled off the parallel (taking any shorter path over the head, which
 * is never shorter than the straight line) can read under the true `around`
 * length. mm, ≥ 0.
 * @example parallelTapeShortfallMm(500, 100) // ≈ 0.333
 */
export function parallelTapeShortfallMm(radiusMm: number, aroundMm: number): number {
  if (!(radiusMm > 0)) return 0;
  const angle = Math.abs(aroundMm) / radiusMm;
  return Math.abs(aroundMm) - 2 * radiusMm * Math.sin(Math.min(angle, Math.PI) / 2);
}
