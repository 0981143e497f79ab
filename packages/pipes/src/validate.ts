/**
 * Checks shared by every layer: each returns the value when it is acceptable and
 * throws a {@link GirthError} naming the field and the limit when it is not.
 */
import { GirthError } from './errors.js';

/**
 * The value as a finite number.
 * @throws GirthError `NOT_A_NUMBER` for non-numbers or NaN, `NOT_FINITE` for ±Infinity.
 * @example requireFinite(3, 'angleDeg') // 3
 */
export function requireFinite(value: unknown, field: string): number {
  if (typeof value !== 'number' || Number.isNaN(value)) {
    throw new GirthError('NOT_A_NUMBER', field, `${field}: expected a number, got ${String(value)}`, value);
  }
  if (!Number.isFinite(value)) {
    throw new GirthError('NOT_FINITE', field, `${field}: must be finite, got ${String(value)}`, value);
  }
  return value;
}

/**
 * The value as a finite number strictly greater than zero.
 * @throws GirthError `NEGATIVE` when it is zero or below.
 * @example requirePositive(406.4, 'header.odMm') // 406.4
 */
export function requirePositive(value: unknown, field: string): number {
  const v = requireFinite(value, field);
  if (v <= 0) throw new GirthError('NEGATIVE', field, `${field}: must be greater than 0, got ${v}`, value);
  return v;
}

/**
 * The value as a finite number at or above zero.
 * @throws GirthError `NEGATIVE` when it is below zero.
 * @example requireNonNegative(0, 'gapMm') // 0
 */
export function requireNonNegative(value: unknown, field: string): number {
  const v = requireFinite(value, field);
  if (v < 0) throw new GirthError('NEGATIVE', field, `${field}: must not be negative, got ${v}`, value);
  return v;
}

/**
 * The value as a finite number within [min, max] (each end open when so asked).
 * `describe` words the limits for the message, e.g. `"between 0 and 90 degrees"`.
 * @throws GirthError `OUT_OF_RANGE` naming the limits.
 * @example requireInRange(45, 'angleDeg', 0, 90, { minOpen: true }) // 45
 */
export function requireInRange(
  value: unknown,
  field: string,
  min: number,
  max: number,
  options: { readonly minOpen?: boolean; readonly maxOpen?: boolean; readonly unit?: string } = {},
): number {
  const v = requireFinite(value, field);
  const belowMin = options.minOpen ? v <= min : v < min;
  const aboveMax = options.maxOpen ? v >= max : v > max;
  if (belowMin || aboveMax) {
    const lo = options.minOpen ? '(' : '[';
    const hi = options.maxOpen ? ')' : ']';
    const unit = options.unit ? ` ${options.unit}` : '';
    throw new GirthError('OUT_OF_RANGE', field, `${field}: must be in ${lo}${min}, ${max}${hi}${unit}, got ${v}${unit}`, value);
  }
  return v;
}

/**
 * The value as an integer within [min, max].
 * @throws GirthError `OUT_OF_RANGE` for fractions or values outside the limits.
 * @example requireInteger(16, 'stations', 4, 360) // 16
 */
export function requireInteger(value: unknown, field: string, min: number, max: number): number {
  const v = requireFinite(value, field);
  if (!Number.isInteger(v) || v < min || v > max) {
    throw new GirthError('OUT_OF_RANGE', field, `${field}: must be a whole number from ${min} to ${max}, got ${v}`, value);
  }
  return v;
}
