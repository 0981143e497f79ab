/**
 * Checks a groove against the wall it is cut in.
 */
import { formatLengthBoth, GirthError, requireInRange, requireNonNegative } from '@girth/pipes';
import type { GrooveSpec, ResolvedGroove } from './types.js';

/**
 * The groove checked field by field: `grooveAngleDeg` in (0, 90) degrees,
 * `landMm` ≥ 0 (0 when left out) and thinner than the wall.
 *
 * @param groove the groove as given.
 * @param wallMm wall of the pipe that is beveled, mm, > 0 (already checked by the joint).
 * @throws GirthError `BAD_OPTION` (field `groove`) when `groove` is not an
 *   object; `OUT_OF_RANGE` (field `grooveAngleDeg`) outside (0, 90);
 *   `NOT_A_NUMBER` / `NOT_FINITE` naming the field; `NEGATIVE` (field
 *   `landMm`) for a negative land; `OUT_OF_RANGE` (field `landMm`) for a land
 *   as thick as the wall or thicker, naming the wall.
 * @example resolveGroove({ grooveAngleDeg: 45, landMm: 1.6 }, 7.11).landMm // 1.6
 */
export function resolveGroove(groove: GrooveSpec, wallMm: number): ResolvedGroove {
  if (groove === null || typeof groove !== 'object') {
    throw new GirthError('BAD_OPTION', 'groove', 'groove: expected { grooveAngleDeg, landMm? }', groove);
  }
  const grooveAngleDeg = requireInRange(groove.grooveAngleDeg, 'grooveAngleDeg', 0, 90, { minOpen: true, maxOpen: true, unit: 'degrees' });
  const landMm = groove.landMm === undefined ? 0 : requireNonNegative(groove.landMm, 'landMm');
  if (!(landMm < wallMm)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'landMm',
      `landMm: the land (root face) ${formatLengthBoth(landMm)} must be thinner than the wall ${formatLengthBoth(wallMm)}`,
      groove.landMm,
    );
  }
  return { kind: 'groove', grooveAngleDeg, landMm, wallMm };
}
