/**
 * Warnings for a miter elbow against ASME B31.3 para. 304.2.3.
 */
import type { GirthWarning } from '@girth/pipes';
import { codeMinMiterRadiusMm } from './code-min-radius.js';
import { B31_3_MULTIPLE_MITER_MAX_CUT_DEG, CUT_ANGLE_EPS_DEG } from './limits.js';
import type { ResolvedMiterSpec } from './types.js';

/**
 * What a resolved miter should be warned about (never an error: the layout is
 * still drawn). Only multiple miters (two or more welds) are checked:
 * - `MITER_CUT_ANGLE_OVER_LIMIT`: cut angle over 22.5° (B31.3 para. 304.2.3);
 * - `MITER_RADIUS_BELOW_MIN`: centreline radius below R1 of B31.3 eq. (5), as
 *   recalled (see {@link codeMinMiterRadiusMm}).
 *
 * @example miterWarnings(resolveMiterSpec({ pipe, bendDeg: 90, welds: 1, radiusMm: 300 })) // []
 */
export function miterWarnings(spec: ResolvedMiterSpec): readonly GirthWarning[] {
  if (spec.welds < 2) return [];
  const warnings: GirthWarning[] = [];
  if (spec.cutAngleDeg > B31_3_MULTIPLE_MITER_MAX_CUT_DEG + CUT_ANGLE_EPS_DEG) {
    warnings.push({
      code: 'MITER_CUT_ANGLE_OVER_LIMIT',
      field: 'welds',
      message: `each cut leans ${round(spec.cutAngleDeg)}°; ASME B31.3 para. 304.2.3 allows at most 22.5° for multiple miters: use at least ${Math.ceil(spec.bendDeg / (2 * B31_3_MULTIPLE_MITER_MAX_CUT_DEG) - 1e-9)} welds`,
    });
  }
  const minR = codeMinMiterRadiusMm(spec.pipe.odMm, spec.pipe.wallMm, spec.cutAngleDeg);
  if (spec.radiusMm < minR) {
    warnings.push({
      code: 'MITER_RADIUS_BELOW_MIN',
      field: 'radiusMm',
      message: `a centreline radius of ${round(spec.radiusMm)} mm is below ${round(minR)} mm, the least ASME B31.3 eq. (5) allows for a ${round(spec.pipe.wallMm)} mm wall at a ${round(spec.cutAngleDeg)}° cut (as recalled; check the code)`,
    });
  }
  return warnings;
}

function round(x: number): string {
  return String(Math.round(x * 1000) / 1000);
}
