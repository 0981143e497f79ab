/**
 * The two square lines a fitter may measure a cut's ordinates from.
 */
import { GirthError } from '@girth/pipes';

/**
 * Which square line the ordinates of a cut are measured from:
 * - `long-point`: the square line through the long point (Girth's cutback:
 *   zero at the long point, largest at the short point);
 * - `short-point`: the square line through the short point (hand layout's
 *   ordinates: zero at the short point, largest at the long point).
 */
export type OrdinateReference = 'long-point' | 'short-point';

/** Every {@link OrdinateReference}, in the order options list them. */
export const ORDINATE_REFERENCES: readonly OrdinateReference[] = ['long-point', 'short-point'];

/** The reference Girth uses when none is asked for (today's cutback). */
export const DEFAULT_ORDINATE_REFERENCE: OrdinateReference = 'long-point';

/** Plain words naming each reference, printed on every output that gives ordinates. */
export const ORDINATE_REFERENCE_WORDS: Readonly<Record<OrdinateReference, string>> = {
  'long-point': 'measured from the square line through the long point',
  'short-point': 'measured from the square line through the short point',
};

/**
 * The value as an {@link OrdinateReference}.
 * @param field the option's name as the user wrote it (default `ordinatesFrom`).
 * @throws GirthError `BAD_OPTION` naming `field` and the accepted names.
 * @example requireOrdinateReference('short-point') // 'short-point'
 */
export function requireOrdinateReference(value: unknown, field = 'ordinatesFrom'): OrdinateReference {
  if (value === 'long-point' || value === 'short-point') return value;
  throw new GirthError(
    'BAD_OPTION',
    field,
    `${field}: must be ${ORDINATE_REFERENCES.map((r) => `'${r}'`).join(' or ')} (the square line the ordinates are measured from), got ${JSON.stringify(value)}`,
    value,
  );
}
