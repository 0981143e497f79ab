/**
 * Building a cone frustum and reading points, elements and normals off it.
 */
import { GirthError, requireFinite, requirePositive } from '@girth/pipes';
import { cross, normalize, sub, type Vec3 } from '../vec3.js';
import type { ConeElement, ConeFrustum } from './types.js';

/** Input of {@link makeConeFrustum}. Lengths in mm. */
export interface ConeFrustumInput {
  readonly largeRadiusMm: number;
  readonly smallRadiusMm: number;
  readonly lengthMm: number;
  /** Sideways offset of the small end's centre, mm; default 0 (concentric). */
  readonly offsetMm?: number;
}

/**
 * A checked {@link ConeFrustum}.
 *
 * @param input radii and length in mm: 0 < smallRadiusMm < largeRadiusMm,
 *   lengthMm > 0, offsetMm finite (default 0).
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE`/`NEGATIVE` for a bad number,
 *   `OUT_OF_RANGE` (field `smallRadiusMm`) when the small end is not smaller.
 * @example makeConeFrustum({ largeRadiusMm: 100, smallRadiusMm: 50, lengthMm: 150 }).offsetMm // 0
 */
export function makeConeFrustum(input: ConeFrustumInput): ConeFrustum {
  const largeRadiusMm = requirePositive(input.largeRadiusMm, 'largeRadiusMm');
  const smallRadiusMm = requirePositive(input.smallRadiusMm, 'smallRadiusMm');
  const lengthMm = requirePositive(input.lengthMm, 'lengthMm');
  const offsetMm = requireFinite(input.offsetMm ?? 0, 'offsetMm');
  if (!(smallRadiusMm < largeRadiusMm)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'smallRadiusMm',
      `smallRadiusMm: the small end (${smallRadiusMm} mm) must be smaller than the large end (${largeRadiusMm} mm)`,
      input.smallRadiusMm,
    );
  }
  return { kind: 'cone-frustum', largeRadiusMm, smallRadiusMm, lengthMm, offsetMm };
}

/**
 * The element of `frustum` at station angle `thetaRad`: from the large-end
 * point at that angle to the small-end point at the same angle (mm).
 * @example frustumElement(f, 0).large // [f.largeRadiusMm, 0, 0]
 */
export function frustumElement(frustum: ConeFrustum, thetaRad: number): ConeElement {
  const c = Math.cos(thetaRad);
  const s = Math.sin(thetaRad);
  const R = frustum.largeRadiusMm;
  const r = frustum.smallRadiusMm;
  return {
    kind: 'cone-element',
    thetaRad,
    large: [R * c, R * s, 0],
    small: [frustum.offsetMm + r * c, r * s, frustum.lengthMm],
  };
}

/**
 * The apex of `frustum`, where all its elements meet (mm): the centre of the
 * similarity that maps the large end onto the small end.
 * @example frustumApex(makeConeFrustum({ largeRadiusMm: 2, smallRadiusMm: 1, lengthMm: 1 })) // [0, 0, 2]
 */
export function frustumApex(frustum: ConeFrustum): Vec3 {
  const k = frustum.largeRadiusMm / (frustum.largeRadiusMm - frustum.smallRadiusMm);
  return [frustum.offsetMm * k, 0, frustum.lengthMm * k];
}

/**
 * The outward unit normal of `frustum` along its element at `thetaRad`. A cone
 * is developable: the normal is the same at every point of one element.
 * Outward means away from the axis (its x, y part points along the radius).
 * @example frustumNormal(f, 0)[0] > 0 // true
 */
export function frustumNormal(frustum: ConeFrustum, thetaRad: number): Vec3 {
  const e = frustumElement(frustum, thetaRad);
  const R = frustum.largeRadiusMm;
  const tangent: Vec3 = [-R * Math.sin(thetaRad), R * Math.cos(thetaRad), 0];
  // tangent × element points away from the axis (x, y part along +radius).
  return normalize(cross(tangent, sub(e.small, e.large)));
}

/**
 * The angle between the element at `thetaRad` and the cone axis (z), radians
 * in [0, π/2). For a concentric cone it is the half-apex angle everywhere; for
 * an eccentric one it is 0 on the flat side.
 * @example elementInclinationRad(f, 0)
 */
export function elementInclinationRad(frustum: ConeFrustum, thetaRad: number): number {
  const e = frustumElement(frustum, thetaRad);
  const d = sub(e.small, e.large);
  return Math.atan2(Math.hypot(d[0], d[1]), d[2]);
}
