/**
 * Writing lengths out for people: decimal millimetres, decimal inches, or
 * feet-inch-fractions. This is the only place Girth rounds a length.
 */
import { toFixedHalfAway } from './decimal.js';
import { GirthError } from '../errors.js';
import { requireFinite } from '../validate.js';
import { feetInchParts, requireFractionDenominator, type FractionDenominator } from './fraction.js';
import { mmToInches, type LengthFormat } from './units.js';

/** Options of {@link formatLength}. */
export interface FormatLengthOptions {
  /** `'mm'` (`652.5 mm`), `'in'` (`25.688"`) or `'ft-in'` (`2'-1 11/16"`). */
  readonly format: LengthFormat;
  /** For `'ft-in'`: round to 1/8, 1/16 (default) or 1/32 inch. */
  readonly fraction?: FractionDenominator;
  /** For `'mm'` and `'in'`: digits after the point, 0 to 6; default 1 for mm, 3 for in. */
  readonly decimals?: number;
  /** The field named in errors. Default `'length'`. */
  readonly field?: string;
}

const DEFAULT_DECIMALS: Readonly<Record<'mm' | 'in', number>> = { mm: 1, in: 3 };

function requireDecimals(value: unknown): number {
  if (typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= 6) return value;
  throw new GirthError('BAD_OPTION', 'decimals', `decimals: must be a whole number from 0 to 6, got ${String(value)}`, value);
}

/** `value` to `decimals` places, half away from zero, never `-0`. */
const fixed = toFixedHalfAway;

/**
 * Writes a length for people, rounding it to the format's resolution.
 *
 * - `mm`: decimal millimetres, `652.5 mm` (1 decimal by default);
 * - `in`: decimal inches, `25.688"` (3 decimals by default);
 * - `ft-in`: feet-inch-fractions to the nearest 1/16 in by default (1/8 or
 *   1/32 on request), fractions reduced and carried (`1'-0"`, never
 *   `11 16/16"` or `0'-12"`); under a foot as inches only (`1 11/16"`, `3/4"`),
 *   a foot or more as `2'-1 11/16"`; zero as `0"`.
 * Negative values get a leading minus; a value that rounds to zero never does.
 * The result reads back with `parseLength` to the rounded value.
 *
 * @param mm the length in millimetres, finite (negative allowed).
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` for NaN or ±Infinity, `BAD_OPTION`
 *   for an unknown format, fraction or decimals, `OUT_OF_RANGE` for a length too
 *   long to write in inch fractions.
 * @example formatLength(652.4625, { format: 'ft-in' }) // `2'-1 11/16"`
 * @example formatLength(652.4625, { format: 'mm' }) // '652.5 mm'
 * @example formatLength(652.4625, { format: 'in', decimals: 4 }) // '25.6875"'
 */
export function formatLength(mm: number, options: FormatLengthOptions): string {
  const field = options.field ?? 'length';
  const v = requireFinite(mm, field);
  switch (options.format) {
    case 'mm':
      return `${fixed(v, requireDecimals(options.decimals ?? DEFAULT_DECIMALS.mm))} mm`;
    case 'in':
      return `${fixed(mmToInches(v), requireDecimals(options.decimals ?? DEFAULT_DECIMALS.in))}"`;
    case 'ft-in': {
      const p = feetInchParts(v, requireFractionDenominator(options.fraction ?? 16));
      const sign = p.negative ? '-' : '';
      const fraction = p.numerator === 0 ? '' : `${p.numerator}/${p.denominator}`;
      let inchText: string;
      if (fraction === '') inchText = String(p.inches);
      else if (p.inches === 0 && p.feet === 0) inchText = fraction;
      else inchText = `${p.inches} ${fraction}`;
      return p.feet === 0 ? `${sign}${inchText}"` : `${sign}${p.feet}'-${inchText}"`;
    }
    default:
      throw new GirthError(
        'BAD_OPTION',
        'format',
        `format: must be mm, in or ft-in, got ${String((options as { format?: unknown }).format)}`,
        (options as { format?: unknown }).format,
      );
  }
}
