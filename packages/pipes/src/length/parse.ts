/**
 * Reading lengths as a fitter writes them, into millimetres.
 */
import { readLength } from '../internal/read-length.js';
import type { LengthUnit } from './units.js';

/** Options of {@link parseLength}. */
export interface ParseLengthOptions {
  /** The job's unit, used for bare numbers (`18.5`, `25 11/16`). Default `'mm'`. */
  readonly unit?: LengthUnit;
  /** The input field named in errors, e.g. `offset` or `jobs[2].length`. Default `'length'`. */
  readonly field?: string;
  /** Accept lengths below zero (offsets may be negative). Default false. */
  readonly allowNegative?: boolean;
}

/**
 * A length written by hand, in millimetres. Nothing is rounded.
 *
 * Accepted forms (whitespace and letter case do not matter):
 * - feet and inches: `2'-1 11/16"`, `2' 1-11/16"`, `1ft 6in`, `2ft`, `5'`;
 * - inches: `25 11/16"`, `25-11/16"`, `25.6875in`, `25.6875"`, `3/4"`, `6 inches`;
 * - metric: `652mm`, `65.2cm`, `0.652m`;
 * - bare numbers, mixed numbers and fractions (`18.5`, `.375`, `25 11/16`) in
 *   `options.unit` (default mm); a plain number is likewise read in `options.unit`.
 * Typographic primes and quotes (′ ″ ’ ”), Unicode minus signs and fractions
 * such as `½` are accepted too.
 *
 * @param text the length as typed, or a number in `options.unit`.
 * @returns the length in millimetres, finite; 0 is returned as +0.
 * @throws GirthError (field = `options.field ?? 'length'`): `EMPTY_INPUT` for blank
 *   text; `BAD_LENGTH` for text that is not a length; `UNKNOWN_UNIT` for a
 *   mistyped unit (`12 inn`, `5 mmm`), listing the accepted ones;
 *   `DIVIDE_BY_ZERO` for a fraction over zero (`1/0`); `NEGATIVE` for a length
 *   below zero unless `allowNegative`; `NOT_A_NUMBER` for NaN; `NOT_FINITE`
 *   for ±Infinity or a number too large to be finite.
 * @example parseLength(`2'-1 11/16"`) // 652.4625
 * @example parseLength('18.5', { unit: 'in' }) // 469.9
 * @example parseLength('-2in', { allowNegative: true, field: 'offset' }) // -50.8
 */
export function parseLength(text: string | number, options: ParseLengthOptions = {}): number {
  return readLength(text, options).mm;
}
