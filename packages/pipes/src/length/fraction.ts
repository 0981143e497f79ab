/**
 * Rounding to inch fractions, the way a fitter reads a tape: to the nearest
 * 1/8, 1/16 or 1/32 inch, written as feet, whole inches and a reduced fraction.
 */
import { GirthError } from '../errors.js';
import { requireFinite } from '../validate.js';
import { INCHES_PER_FOOT, inchesToMm, mmToInches } from './units.js';

/** The inch fractions a tape is read to: 1/8, 1/16 (the default in the field) or 1/32. */
export type FractionDenominator = 8 | 16 | 32;

/** The denominators {@link FractionDenominator} allows, for checks and help text. */
export const FRACTION_DENOMINATORS: readonly FractionDenominator[] = [8, 16, 32];

/**
 * A length split the way it is written in feet-inch-fractions. Always
 * normalised: `inches` is 0..11, `numerator < denominator`, the fraction is
 * reduced (`8/16` is `1/2`), and a whole inch has `numerator` 0 and
 * `denominator` 1.
 */
export interface FeetInchParts {
  readonly kind: 'feet-inch-parts';
  /** True for lengths below zero that are not zero once rounded. */
  readonly negative: boolean;
  /** Whole feet, ≥ 0. */
  readonly feet: number;
  /** Whole inches after the feet, 0..11. */
  readonly inches: number;
  /** Numerator of the reduced fraction of an inch, 0 ≤ numerator < denominator. */
  readonly numerator: number;
  /** Denominator of the reduced fraction, 1 (no fraction), 2, 4, 8, 16 or 32. */
  readonly denominator: number;
}

/** Above this many steps the integer arithmetic of rounding would lose exactness. */
const MAX_STEPS = Number.MAX_SAFE_INTEGER / 2;

/**
 * The denominator as given, when it is one of 8, 16 or 32.
 * @param field the option named in errors; default `'fraction'`.
 * @throws GirthError `BAD_OPTION` otherwise.
 * @example requireFractionDenominator(16) // 16
 */
export function requireFractionDenominator(value: unknown, field = 'fraction'): FractionDenominator {
  if (value === 8 || value === 16 || value === 32) return value;
  throw new GirthError(
    'BAD_OPTION',
    field,
    `${field}: inch fractions are 8, 16 or 32 (1/8, 1/16 or 1/32 in), got ${String(value)}`,
    value,
  );
}

/**
 * The length as a whole number of `1/denominator` inch steps, rounded to the
 * nearest step (halves away from zero, so the rounding is symmetric about 0).
 */
function toSteps(mm: number, denominator: FractionDenominator, field: string): number {
  const v = requireFinite(mm, field);
  const den = requireFractionDenominator(denominator);
  const exact = mmToInches(Math.abs(v)) * den;
  if (exact > MAX_STEPS) {
    throw new GirthError('OUT_OF_RANGE', field, `${field}: ${v} mm is too long to write in inch fractions`, mm);
  }
  // An exact half step can arrive as 96.49999999999999 after the mm -> inch
  // division; a nudge of 1e-14 relative keeps such halves rounding away from zero.
  const steps = Math.round(exact + exact * 1e-14);
  return Math.sign(v) * steps;
}

/**
 * The length rounded to the nearest `1/denominator` inch, in millimetres.
 * Halves round away from zero.
 *
 * @param mm any finite length in millimetres (negative allowed).
 * @param denominator 8, 16 or 32.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` for NaN or ±Infinity, `BAD_OPTION`
 *   for another denominator, `OUT_OF_RANGE` for absurdly long lengths.
 * @example roundToFraction(42.9, 16) // 42.8625 (1 11/16 in)
 */
export function roundToFraction(mm: number, denominator: FractionDenominator): number {
  const steps = toSteps(mm, denominator, 'length');
  const r = inchesToMm(steps / denominator);
  return r === 0 ? 0 : r;
}

/**
 * The length rounded to the nearest `1/denominator` inch and split into feet,
 * inches and a reduced fraction, with carries done (11 15/16 in plus 1/16 in is
 * 1 ft 0 in, never 11 16/16 in nor 0 ft 12 in).
 *
 * @param mm any finite length in millimetres (negative allowed).
 * @param denominator 8, 16 (default) or 32.
 * @throws GirthError as {@link roundToFraction}.
 * @example feetInchParts(652.4625) // { feet: 2, inches: 1, numerator: 11, denominator: 16, ... }
 */
export function feetInchParts(mm: number, denominator: FractionDenominator = 16): FeetInchParts {
  const steps = toSteps(mm, denominator, 'length');
  const abs = Math.abs(steps);
  const perFoot = INCHES_PER_FOOT * denominator;
  const feet = Math.floor(abs / perFoot);
  const rest = abs - feet * perFoot;
  const inches = Math.floor(rest / denominator);
  let numerator = rest - inches * denominator;
  let den: number = denominator;
  if (numerator === 0) {
    den = 1;
  } else {
    while (numerator % 2 === 0 && den % 2 === 0) {
      numerator /= 2;
      den /= 2;
    }
  }
  return { kind: 'feet-inch-parts', negative: steps < 0, feet, inches, numerator, denominator: den };
}
