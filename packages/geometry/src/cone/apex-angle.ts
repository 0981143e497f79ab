/**
 * Length of a reducer from its apex angle and back.
 *
 * The apex angle is the included angle at the apex between the two elements
 * that lie in the plane through the axis and the flat side: for a concentric
 * cone twice the half-apex angle, tan(angle / 2) = (D − d) / (2 L); for an
 * eccentric cone the angle between the flat side (parallel to the axis) and
 * the opposite element, tan(angle) = (D − d) / L. D and d are the end
 * diameters of one surface; the angle is the same on every surface of the
 * plate, since the mean and inside surfaces are the outside moved square to
 * itself.
 */
import { GirthError, requireInRange, requirePositive } from '@girth/pipes';
import type { ConeForm } from './types.js';

const DEG = Math.PI / 180;

/**
 * The axial length of a reducer (mm) whose end diameters differ by
 * `diameterDifferenceMm` and whose apex angle is `apexAngleDeg`.
 *
 * @param diameterDifferenceMm D − d, mm (> 0).
 * @param apexAngleDeg included apex angle, degrees in (0, 180) for concentric,
 *   (0, 90) for eccentric.
 * @throws GirthError `NEGATIVE` for D − d ≤ 0, `OUT_OF_RANGE` for an angle outside its range.
 * @example coneLengthFromApexAngle(3, 2 * Math.atan(1.5 / 4) * 180 / Math.PI, 'concentric') // 4
 */
export function coneLengthFromApexAngle(diameterDifferenceMm: number, apexAngleDeg: number, form: ConeForm): number {
  const dd = requirePositive(diameterDifferenceMm, 'diameterDifferenceMm');
  const maxDeg = form === 'concentric' ? 180 : 90;
  const a = requireInRange(apexAngleDeg, 'apexAngleDeg', 0, maxDeg, { minOpen: true, maxOpen: true, unit: 'deg' });
  const lengthMm = form === 'concentric' ? dd / 2 / Math.tan((a * DEG) / 2) : dd / Math.tan(a * DEG);
  if (!(lengthMm > 0 && Number.isFinite(lengthMm))) {
    throw new GirthError('OUT_OF_RANGE', 'apexAngleDeg', `apexAngleDeg: ${a}° leaves no length between the ends`, apexAngleDeg);
  }
  return lengthMm;
}

/**
 * The included apex angle (degrees) of a reducer with end diameters differing
 * by `diameterDifferenceMm` over the axial length `lengthMm`; the inverse of
 * {@link coneLengthFromApexAngle}.
 * @throws GirthError `NEGATIVE` for a length or difference ≤ 0.
 * @example coneApexAngleDeg(3, 4, 'eccentric') // 36.87 (atan 3/4)
 */
export function coneApexAngleDeg(diameterDifferenceMm: number, lengthMm: number, form: ConeForm): number {
  const dd = requirePositive(diameterDifferenceMm, 'diameterDifferenceMm');
  const L = requirePositive(lengthMm, 'lengthMm');
  return form === 'concentric' ? (2 * Math.atan(dd / 2 / L)) / DEG : Math.atan(dd / L) / DEG;
}
