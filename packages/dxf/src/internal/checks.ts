/**
 * Input checks of the exporter: every number that reaches the file is finite
 * and within {@link MAX_COORD_MM}; anything else is a typed error naming the field.
 */
import { GirthError, requireFinite, requirePositive } from '@girth/pipes';
import type { Point2 } from '@girth/unroll';
import { MAX_COORD_MM } from '../tolerances.js';

/** A coordinate (mm) that is finite and within the size limit. */
export function checkCoordMm(value: unknown, field: string): number {
  const v = requireFinite(value, field);
  if (Math.abs(v) > MAX_COORD_MM) {
    throw new GirthError(
      'OUT_OF_RANGE',
      field,
      `${field}: ${v} mm is farther than ${MAX_COORD_MM} mm from the origin; no template is that large (check the units)`,
      value,
    );
  }
  return v;
}

/** A point (mm) whose both coordinates pass {@link checkCoordMm}. */
export function checkPointMm(p: Point2, field: string): Point2 {
  if (!Array.isArray(p) || p.length < 2) {
    throw new GirthError('NOT_A_NUMBER', field, `${field}: expected a point [x, y] in mm, got ${String(p)}`, p);
  }
  return [checkCoordMm(p[0], `${field}[0]`), checkCoordMm(p[1], `${field}[1]`)];
}

/** A length (mm) that is finite, positive and within the size limit. */
export function checkLengthMm(value: unknown, field: string): number {
  const v = requirePositive(value, field);
  return checkCoordMm(v, field);
}
