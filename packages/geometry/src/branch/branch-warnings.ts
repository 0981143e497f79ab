/**
 * What a fitter or designer should know about a branch joint that does not
 * stop its layout.
 */
import { type GirthWarning, formatLengthBoth } from '@girth/pipes';
import { LENGTH_EPS_MM, SHALLOW_LATERAL_WARN_DEG } from '../tolerances.js';
import type { ResolvedBranchSpec } from './types.js';

/** Branches below this angle (degrees) fall outside ASME B31.3 para. 304.3.1(b) reinforcement rules (REFERENCES.md). */
export const REINFORCEMENT_RULES_MIN_ANGLE_DEG = 45;

/** Stable codes of the warnings {@link branchWarnings} gives. */
export type BranchWarningCode = 'SHALLOW_LATERAL' | 'REINFORCEMENT_RULES_ANGLE' | 'REINFORCEMENT_RULES_OFFSET';

const GEOMETRY_ONLY = 'Girth lays out geometry only and does not size reinforcement; have the design checked under the governing code.';

/**
 * Warnings for a checked branch spec: a lateral below
 * `SHALLOW_LATERAL_WARN_DEG` (a long feather edge at the crotch); a branch
 * below 45° or an offset branch, both outside the reinforcement rules of
 * ASME B31.3 para. 304.3.1(b).
 * @example branchWarnings(spec).map((w) => w.code) // ['REINFORCEMENT_RULES_ANGLE']
 */
export function branchWarnings(spec: ResolvedBranchSpec): readonly GirthWarning[] {
  const out: GirthWarning[] = [];
  const a = spec.angleDeg;
  if (a < SHALLOW_LATERAL_WARN_DEG) {
    out.push({
      code: 'SHALLOW_LATERAL',
      field: 'angleDeg',
      message: `A lateral at ${a}° (below ${SHALLOW_LATERAL_WARN_DEG}°) leaves a long feather edge at the crotch that is hard to fit and weld.`,
    });
  }
  if (a < REINFORCEMENT_RULES_MIN_ANGLE_DEG) {
    out.push({
      code: 'REINFORCEMENT_RULES_ANGLE',
      field: 'angleDeg',
      message: `ASME B31.3 para. 304.3.1(b) branch reinforcement rules cover branches at ${REINFORCEMENT_RULES_MIN_ANGLE_DEG}° or more; this one is at ${a}°. ${GEOMETRY_ONLY}`,
    });
  }
  if (Math.abs(spec.offsetMm) > LENGTH_EPS_MM) {
    out.push({
      code: 'REINFORCEMENT_RULES_OFFSET',
      field: 'offsetMm',
      message: `ASME B31.3 para. 304.3.1(b) branch reinforcement rules cover branches whose axis meets the run axis; this one is offset ${formatLengthBoth(spec.offsetMm)}. ${GEOMETRY_ONLY}`,
    });
  }
  return out;
}
