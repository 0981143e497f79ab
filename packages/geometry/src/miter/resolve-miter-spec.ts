/**
 * Checks a miter spec and resolves its choices (welds or pieces, radius in mm
 * or in nominal sizes).
 */
import { BEND_DEG, formatLengthBoth, GirthError, requireWithin, MM_PER_INCH as MM_PER_IN, requireFinite, requireInteger, requireNonNegative, requirePositive } from '@girth/pipes';
import { fitRadiusMm, type CutFitSurface } from '../plane-cut/fit-surface.js';
import { resolvePipeSection, type ResolvedPipeSection } from '../pipe-section.js';
import { MAX_MITER_RADIUS_MM, MAX_MITER_WELDS } from './limits.js';
import type { MiterSpec, ResolvedMiterSpec } from './types.js';


/**
 * Checks a {@link MiterSpec} and resolves it: the number of welds, the cut
 * angle, the centreline radius in mm, the tangent and the fit surface.
 *
 * @throws GirthError
 *  - `OUT_OF_RANGE` (`bendDeg`) for a bend outside (0, 180];
 *  - `BAD_OPTION` (`welds`/`pieces`) when both are given, `MISSING_INPUT` (`welds`) when neither is;
 *  - `OUT_OF_RANGE` (`welds`/`pieces`) for a count that is not a whole number from 1
 *    weld (2 pieces) to 90 welds, or a single weld asked to turn 180°;
 *  - `BAD_OPTION` (`radiusMm`/`radiusNps`) when both are given (`MISSING_INPUT` on `radiusMm` when neither is), or
 *    `radiusNps` without `pipe.npsIn`;
 *  - `OUT_OF_RANGE` (`radiusMm`/`radiusNps`) for a radius below half the OD;
 *  - `NEGATIVE` (`tangentMm`, `gapMm`); `OUT_OF_RANGE` (`gapMm`) for a root gap
 *    that leaves a piece no throat; `NOT_A_NUMBER`/`NOT_FINITE` for NaN or Infinity
 *    anywhere; `BAD_CHOICE` (`fitSurface`); the pipe errors of `resolvePipeSection`.
 * @example resolveMiterSpec({ pipe: { odMm: 323.9, wallMm: 9.53 }, bendDeg: 90, pieces: 4, radiusMm: 457.2 }).cutAngleDeg // 15
 */
export function resolveMiterSpec(spec: MiterSpec): ResolvedMiterSpec {
  if (spec === null || typeof spec !== 'object') {
    throw new GirthError('EMPTY_INPUT', 'miter', 'miter: give the pipe, the bend and the number of welds or pieces', spec);
  }
  const pipe = resolvePipeSection(spec.pipe);
  const bendDeg = requireWithin(spec.bendDeg, 'bendDeg', BEND_DEG);
  const { welds, field: countField } = resolveWelds(spec);
  const cutAngleDeg = bendDeg / (2 * welds);
  if (!(cutAngleDeg < 90)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      countField,
      `${countField}: a ${bendDeg}° bend needs at least ${Math.floor(bendDeg / 180) + 1} welds (${Math.floor(bendDeg / 180) + 2} pieces); with ${welds} each cut would lean ${cutAngleDeg}°, and a cut must lean less than 90°`,
      countField === 'welds' ? spec.welds : spec.pieces,
    );
  }
  const radiusMm = resolveRadiusMm(spec, pipe);
  const tangentMm = spec.tangentMm === undefined ? 0 : requireNonNegative(spec.tangentMm, 'tangentMm');
  const fitSurface: CutFitSurface = spec.fitSurface ?? 'od';
  const fitR = fitRadiusMm(pipe, fitSurface);
  const gapMm = resolveGapMm(spec, { radiusMm, fitRadiusMm: fitR, cutAngleDeg, welds, tangentMm });
  return {
    kind: 'miter-spec',
    pipe,
    bendDeg,
    welds,
    pieceCount: welds + 1,
    cutAngleDeg,
    radiusMm,
    tangentMm,
    fitSurface,
    fitRadiusMm: fitR,
    gapMm,
  };
}

/**
 * The root gap, checked: ≥ 0, and small enough that every piece keeps some
 * throat. Each cut end is set back g / 2 square to its weld plane, that is
 * g / (2 cos c) along the pipe, from a throat of (R − r) tan c per cut end
 * (plus the tangent on an end piece): with middle pieces g < 2 (R − r) sin c,
 * else g < 2 ((R − r) tan c + tangent) cos c.
 */
function resolveGapMm(
  spec: MiterSpec,
  e: { readonly radiusMm: number; readonly fitRadiusMm: number; readonly cutAngleDeg: number; readonly welds: number; readonly tangentMm: number },
): number {
  if (spec.gapMm === undefined) return 0;
  const g = requireNonNegative(spec.gapMm, 'gapMm');
  if (g === 0) return 0;
  const c = (e.cutAngleDeg * Math.PI) / 180;
  const throatMm = (e.radiusMm - e.fitRadiusMm) * Math.tan(c);
  const mostMm = e.welds >= 2 ? 2 * throatMm * Math.cos(c) : 2 * (throatMm + e.tangentMm) * Math.cos(c);
  if (!(g < mostMm)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'gapMm',
      `gapMm: a root gap of ${formatLengthBoth(g)} leaves a piece no length on the throat; it must be less than ${formatLengthBoth(mostMm)} for this radius and cut angle`,
      spec.gapMm,
    );
  }
  return g;
}

function resolveWelds(spec: MiterSpec): { welds: number; field: 'welds' | 'pieces' } {
  const hasWelds = spec.welds !== undefined;
  const hasPieces = spec.pieces !== undefined;
  if (hasWelds && hasPieces) {
    throw new GirthError('BAD_OPTION', 'pieces', 'pieces: give the number of welds or of pieces, not both (pieces = welds + 1)', spec.pieces);
  }
  if (!hasWelds && !hasPieces) {
    throw new GirthError('MISSING_INPUT', 'welds', 'welds: give the number of welds or of pieces (pieces = welds + 1)');
  }
  if (hasWelds) return { welds: requireInteger(spec.welds, 'welds', 1, MAX_MITER_WELDS), field: 'welds' };
  return { welds: requireInteger(spec.pieces, 'pieces', 2, MAX_MITER_WELDS + 1) - 1, field: 'pieces' };
}

function resolveRadiusMm(spec: MiterSpec, pipe: ResolvedPipeSection): number {
  const halfOd = pipe.odMm / 2;
  const hasMm = spec.radiusMm !== undefined;
  const hasNps = spec.radiusNps !== undefined;
  if (hasMm && hasNps) {
    throw new GirthError('BAD_OPTION', 'radiusNps', 'radiusNps: give the centreline radius as a length or as a multiple of the nominal size, not both', spec.radiusNps);
  }
  if (!hasMm && !hasNps) {
    throw new GirthError('MISSING_INPUT', 'radiusMm', 'radiusMm: give the centreline radius, as a length or as a multiple of the nominal pipe size');
  }
  if (hasMm) {
    const r = requireFinite(spec.radiusMm, 'radiusMm');
    requireRadiusWithinLimit(r, 'radiusMm', spec.radiusMm);
    if (r < halfOd) {
      throw new GirthError(
        'OUT_OF_RANGE',
        'radiusMm',
        `radiusMm: a centreline radius of ${r} mm is less than half the OD (${halfOd} mm); the throat would fold over itself`,
        spec.radiusMm,
      );
    }
    return r;
  }
  const multiple = requirePositive(spec.radiusNps, 'radiusNps');
  if (pipe.npsIn === undefined) {
    throw new GirthError('BAD_OPTION', 'radiusNps', 'radiusNps: a radius in nominal sizes needs a pipe named by its nominal size (NPS); give the radius as a length instead', spec.radiusNps);
  }
  const r = multiple * pipe.npsIn * MM_PER_IN;
  requireRadiusWithinLimit(r, 'radiusNps', spec.radiusNps);
  if (r < halfOd) {
    const least = halfOd / (pipe.npsIn * MM_PER_IN);
    throw new GirthError(
      'OUT_OF_RANGE',
      'radiusNps',
      `radiusNps: ${multiple} × NPS ${pipe.npsIn} is a radius of ${r} mm, less than half the OD (${halfOd} mm); use at least ${least.toFixed(3)}`,
      spec.radiusNps,
    );
  }
  return r;
}

function requireRadiusWithinLimit(radiusMm: number, field: 'radiusMm' | 'radiusNps', value: unknown): void {
  if (!(radiusMm <= MAX_MITER_RADIUS_MM)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      field,
      `${field}: a centreline radius of ${radiusMm.toExponential(3)} mm is beyond the ${MAX_MITER_RADIUS_MM / 1e6} km Girth lays out`,
      value,
    );
  }
}
