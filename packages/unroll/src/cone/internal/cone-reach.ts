/**
 * A reducer's pattern held within the 1 km the exporters draw: a large cone
 * with a shallow included angle has a pattern radius of hundreds of its
 * diameters, and is refused naming the input to change.
 */
import { requireWithinReach } from '../../internal/template-reach.js';
import type { Template } from '../../types.js';
import type { ConeSpec } from '../types.js';

/**
 * Refuses a cone whose pattern reaches past 1 km: on `apexAngleDeg` when the
 * cone was given by its angle, else on `lengthMm` (too long for the change in
 * diameter), as the included-angle limit does.
 * @throws GirthError `OUT_OF_RANGE` naming that field.
 * @example requireConeWithinReach(spec, templates)
 */
export function requireConeWithinReach(spec: ConeSpec, templates: readonly Template[]): void {
  if (spec.apexAngleDeg !== undefined) {
    requireWithinReach(templates, 'apexAngleDeg', spec.apexAngleDeg, 'give a larger included angle, or roll it as a straight pipe');
  } else {
    requireWithinReach(templates, 'lengthMm', spec.lengthMm, 'the cone is too slender for a pattern; make it shorter or the ends differ more in size');
  }
}
