/**
 * The mean surface of a cone rolled from plate.
 *
 * Rule: a flat pattern is developed on the mean surface of the plate, which
 * lies half the plate thickness from the outside (or inside) surface, measured
 * square to the cone surface. Moving a cone's surface square to itself moves
 * each element parallel to itself; cut by the same end planes, the element
 * keeps its true length and its end points move sideways in the end planes by
 * (t/2) · sqrt(1 + (n_z |element| / L)²), where n_z is the axial part of the
 * unit normal. For a concentric cone of half-apex angle a that is (t/2) / cos a
 * radially at both ends; on the flat side of an eccentric cone it is t/2.
 */
import { GirthError, requireNonNegative } from '@girth/pipes';
import { addScaled, cross, norm, normalize, sub } from '../vec3.js';
import { frustumElement, frustumNormal } from './frustum.js';
import type { ConeElement, ConeFrustum, ConeSheet, DiameterSurface } from './types.js';

/**
 * The largest sideways move of an element's end, per mm of move square to the
 * surface, over all elements of `frustum` (≥ 1). For a concentric cone it is
 * 1 / cos(half-apex angle); for an eccentric one it is largest opposite the flat side,
 * 1 / cos of that element's lean.
 *
 * Closed form. With d = R − r > 0, offset o, length L and x = cos theta, the
 * element at theta has the (unnormalised) normal (x L, sin theta · L, a) with
 * a = d − o x, and length² a² + o² sin² theta + L². So the factor is
 * sqrt(1 + g / L²) with g = a² (a² + o² (1 − x²) + L²) / (L² + a²). Written in
 * a (x = (d − a) / o), g = a² (p + 2 d a) / (L² + a²) with p = o² − d² + L²,
 * and g' = 2 a (d a³ + 3 d L² a + p L²) / (L² + a²)². The cubic rises with a
 * and has one root a*: for a > 0, g falls then rises past a* (or only rises),
 * so its largest is at an end of the range; for a < 0, g(−b) = b² (p − 2 d b) /
 * (L² + b²) < g(b). The range of a is [d − |o|, d + |o|], whose largest
 * magnitude is its top, d + |o|: the factor is largest at theta = π (o ≥ 0) or
 * theta = 0 (o < 0), each evaluated on the element itself.
 * @example maxEndShiftFactor(makeConeFrustum({ largeRadiusMm: 2, smallRadiusMm: 1, lengthMm: 1 })) // √2
 */
export function maxEndShiftFactor(frustum: ConeFrustum): number {
  return Math.max(1, endShiftFactor(frustum, 0), endShiftFactor(frustum, Math.PI));
}

function endShiftFactor(frustum: ConeFrustum, thetaRad: number): number {
  const e = frustumElement(frustum, thetaRad);
  const n = frustumNormal(frustum, thetaRad);
  const k = (n[2] * norm(sub(e.small, e.large))) / frustum.lengthMm;
  return Math.sqrt(1 + k * k);
}

/**
 * The thickest plate (mm, exclusive) that `given` can be rolled from when its
 * end diameters belong to `diametersAt`. Two limits, the smaller counts:
 * the inside surface must keep a small end (the largest sideways move of the
 * small end's edge toward the axis stays below the small radius), and the
 * plate must be thinner than the small end's radius, which no roll can bend
 * plate thicker than.
 * @example maxPlateThicknessMm(frustum, 'outside')
 */
export function maxPlateThicknessMm(given: ConeFrustum, diametersAt: DiameterSurface): number {
  const f = maxEndShiftFactor(given);
  const r = given.smallRadiusMm;
  switch (diametersAt) {
    case 'outside':
      return r / f;
    case 'mean':
      return Math.min(r, (2 * r) / f);
    case 'inside':
      return r;
  }
}

/**
 * The mean surface of a cone rolled from plate `thicknessMm` thick whose end
 * diameters on the `diametersAt` surface are those of `given`.
 *
 * @param thicknessMm plate thickness, mm, ≥ 0 and below {@link maxPlateThicknessMm}.
 * @throws GirthError `NEGATIVE`/`NOT_A_NUMBER`/`NOT_FINITE` for a bad thickness,
 *   `WALL_TOO_THICK` (field `thicknessMm`) at or above {@link maxPlateThicknessMm},
 *   `BAD_CHOICE` (field `diametersAt`) for an unknown surface.
 * @example makeConeSheet(frustum, 6, 'outside').normalShiftMm // -3
 */
export function makeConeSheet(given: ConeFrustum, thicknessMm: number, diametersAt: DiameterSurface = 'outside'): ConeSheet {
  const t = requireNonNegative(thicknessMm, 'thicknessMm');
  let normalShiftMm: number;
  switch (diametersAt) {
    case 'outside':
      normalShiftMm = -t / 2;
      break;
    case 'inside':
      normalShiftMm = t / 2;
      break;
    case 'mean':
      normalShiftMm = 0;
      break;
    default:
      throw new GirthError(
        'BAD_CHOICE',
        'diametersAt',
        `diametersAt: must be 'outside', 'inside' or 'mean', got ${String(diametersAt)}`,
        diametersAt,
      );
  }
  const limit = maxPlateThicknessMm(given, diametersAt);
  if (!(t < limit)) {
    throw new GirthError(
      'WALL_TOO_THICK',
      'thicknessMm',
      `thicknessMm: ${t} mm plate is too thick for the small end (${diametersAt} diameter ` +
        `${(2 * given.smallRadiusMm).toFixed(3)} mm); it must be thinner than ${limit.toFixed(3)} mm`,
      thicknessMm,
    );
  }
  return { kind: 'cone-sheet', given, diametersAt, thicknessMm: t, normalShiftMm };
}

/**
 * The element of the mean surface of `sheet` at station angle `thetaRad`, with
 * its ends in the end planes z = 0 and z = L (mm). It is parallel to the given
 * surface's element at the same angle and exactly as long.
 * @example sheetElement(makeConeSheet(f, 0), 0).large // frustumElement(f, 0).large
 */
export function sheetElement(sheet: ConeSheet, thetaRad: number): ConeElement {
  const e = frustumElement(sheet.given, thetaRad);
  const h = sheet.normalShiftMm;
  if (h === 0) return e;
  const u = sub(e.small, e.large);
  // The normal as frustumNormal computes it, reusing this element (one element evaluation, not two).
  const R = sheet.given.largeRadiusMm;
  const n = normalize(cross([-R * Math.sin(thetaRad), R * Math.cos(thetaRad), 0], u));
  // Move by h along the normal, then slide along the element back into the end plane.
  const slide = (-h * n[2]) / u[2];
  const shift = addScaled([n[0] * h, n[1] * h, n[2] * h], u, slide);
  return {
    kind: 'cone-element',
    thetaRad,
    large: [e.large[0] + shift[0], e.large[1] + shift[1], 0],
    small: [e.small[0] + shift[0], e.small[1] + shift[1], sheet.given.lengthMm],
  };
}
