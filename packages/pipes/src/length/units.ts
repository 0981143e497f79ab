/**
 * Length units: the unit a job is written in, the styles lengths are printed
 * in, and exact conversions. Girth computes in millimetres only; these are the
 * edges where other units come in and go out.
 */

/** A job's unit: every bare number in the job (no unit mark) is read in it. */
export type LengthUnit = 'mm' | 'in';

/**
 * How a length is written out: decimal millimetres, decimal inches, or
 * feet-inch-fractions (`2'-1 11/16"`).
 */
export type LengthFormat = 'mm' | 'in' | 'ft-in';

/** Every unit a length may be written in by hand: `mm`, `cm`, `m`, `in` (`"`), `ft` (`'`). */
export type WrittenLengthUnit = 'mm' | 'cm' | 'm' | 'in' | 'ft';

/** Millimetres in one inch, exactly (international inch of 1959). */
export const MM_PER_INCH = 25.4;

/** Inches in one foot. */
export const INCHES_PER_FOOT = 12;

/** Millimetres in one foot, exactly (12 x 25.4). */
export const MM_PER_FOOT = 304.8;

/** Millimetres in one of each written unit. */
export const MM_PER_WRITTEN_UNIT: Readonly<Record<WrittenLengthUnit, number>> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_INCH,
  ft: MM_PER_FOOT,
};

/**
 * Inches to millimetres, computed as `inches x 254 / 10`: the same exact factor
 * as 25.4, but it lands on the nearest double of the decimal result more often
 * (0.375 in gives 9.525, not 9.524999999999999).
 * @param inches any finite number of inches.
 * @example inchesToMm(0.375) // 9.525
 */
export function inchesToMm(inches: number): number {
  return (inches * 254) / 10;
}

/**
 * Millimetres to inches, computed as `mm x 10 / 254` (see {@link inchesToMm}).
 * @param mm any finite number of millimetres.
 * @example mmToInches(406.4) // 16
 */
export function mmToInches(mm: number): number {
  return (mm * 10) / 254;
}

/**
 * A length given in `unit` converted to millimetres. No rounding.
 * @param value the length in `unit`; any finite number.
 * @example lengthToMm(16, 'in') // 406.4
 */
export function lengthToMm(value: number, unit: LengthUnit): number {
  return unit === 'in' ? inchesToMm(value) : value;
}

/**
 * A length in millimetres converted to `unit`. No rounding.
 * @param mm the length in millimetres; any finite number.
 * @example mmToLength(406.4, 'in') // 16
 */
export function mmToLength(mm: number, unit: LengthUnit): number {
  return unit === 'in' ? mmToInches(mm) : mm;
}
