/**
 * Lengths and angles as notes and error messages state them, whatever the
 * job's unit: millimetres with one decimal and inches with three, so a fitter
 * reads either, e.g. `387.4 mm (15.250 in)`. Station tables and printed
 * lengths in the job's unit are written by {@link formatLength}.
 */
import { toFixedHalfAway as fixedHalfAway } from './decimal.js';
import { MM_PER_INCH } from './units.js';

/**
 * A length in millimetres written in both units: mm to 0.1, then inches to
 * 0.001 in brackets. For notes on templates and for error messages.
 *
 * @param mm length in millimetres; any finite number (negative allowed). It
 *   never throws, since it also words messages about bad input: NaN and
 *   ±Infinity are written as JavaScript writes them (`NaN mm (NaN in)`).
 * @returns e.g. `"387.4 mm (15.250 in)"`; `"0.0 mm (0.000 in)"` for zero.
 * @example formatLengthBoth(387.35) // "387.4 mm (15.250 in)"
 * @example formatLengthBoth(25.4) // "25.4 mm (1.000 in)"
 */
export function formatLengthBoth(mm: number): string {
  return `${fixedHalfAway(mm, 1)} mm (${fixedHalfAway(mm / MM_PER_INCH, 3)} in)`;
}

/**
 * An angle in degrees with at most two decimals and no trailing zeros, and
 * the degree sign. For titles, notes and error messages.
 *
 * @param deg angle in degrees; any finite number. Never throws (see
 *   {@link formatLengthBoth}).
 * @example formatAngleDeg(45) // "45°"
 * @example formatAngleDeg(22.5) // "22.5°"
 * @example formatAngleDeg(100 / 3) // "33.33°"
 */
export function formatAngleDeg(deg: number): string {
  return `${Number(deg.toFixed(2))}°`;
}
