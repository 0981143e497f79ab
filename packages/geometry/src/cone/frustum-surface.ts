/**
 * A concentric frustum as a host surface: the right circular cone it lies on.
 */
import { GirthError } from '@girth/pipes';
import type { ConeSurface } from '../surfaces/cone.js';
import { frustumApex } from './frustum.js';
import type { ConeFrustum } from './types.js';

/**
 * The `cone` host surface that a concentric `frustum` lies on, in the
 * frustum's frame (axis along z, large end in z = 0, small end in z = L,
 * theta = 0 along +x): apex on the axis beyond the small end, axis direction
 * −z (from the apex toward the large end), half-apex angle atan((R − r) / L),
 * development measured from the element at theta = 0. A pipe cut to meet a
 * reducer goes through `hitGenerator` with it like any host; its `develop`
 * is the reducer's flat pattern (apex at the origin).
 *
 * @throws GirthError `BAD_OPTION` (field `offsetMm`) for an eccentric
 *   frustum, which is an oblique cone, not a right circular one.
 * @example frustumConeSurface(makeConeFrustum({ largeRadiusMm: 101.6, smallRadiusMm: 63.5, lengthMm: 101.6 })).halfAngleRad // atan(38.1 / 101.6)
 */
export function frustumConeSurface(frustum: ConeFrustum): ConeSurface {
  if (frustum.offsetMm !== 0) {
    throw new GirthError(
      'BAD_OPTION',
      'offsetMm',
      `offsetMm: an eccentric reducer (offset ${frustum.offsetMm} mm) is an oblique cone; only a concentric one is a right circular cone host`,
      frustum.offsetMm,
    );
  }
  return {
    kind: 'cone',
    apex: frustumApex(frustum),
    axisDirection: [0, 0, -1],
    halfAngleRad: Math.atan((frustum.largeRadiusMm - frustum.smallRadiusMm) / frustum.lengthMm),
    zeroGirthDirection: [1, 0, 0],
  };
}
