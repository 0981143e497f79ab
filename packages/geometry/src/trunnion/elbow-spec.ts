/**
 * An elbow from its pipe, radius and bend: the centreline radius the trade's
 * names stand for, and the elbow body's surfaces.
 */
import { BEND_DEG, formatLengthBoth, GirthError, requirePositive, requireWithin } from '@girth/pipes';
import { resolvePipeSection } from '../pipe-section.js';
import type { TorusSurface } from '../surfaces/torus.js';
import type { ElbowSpec, ResolvedElbowSpec } from './types.js';

/** Long radius elbow: centreline radius = 1.5 × NPS, in inches (ASME B16.9, recalled; NPS 3/4 and larger). */
export const LONG_RADIUS_PER_NPS = 1.5;
/** Short radius elbow: centreline radius = 1.0 × NPS, in inches (ASME B16.9, recalled; NPS 1 and larger). */
export const SHORT_RADIUS_PER_NPS = 1;
/** NPS 1/2 long radius elbow: centreline radius 1.5 in (ASME B16.9 lists 1-1/2 in, not 1.5 × NPS; recalled). */
export const LONG_RADIUS_NPS_HALF_IN = 1.5;
const MM_PER_IN = 25.4;

/**
 * Checks an elbow and works out its centreline radius: `long` 1.5 × NPS
 * (1-1/2 in at NPS 1/2), `short` 1.0 × NPS, in inches, or the radius given.
 *
 * @throws GirthError the pipe checks (fields `elbow.*`); `MISSING_INPUT`
 *   (`elbow.radius`) for `long` or `short` without the nominal size;
 *   `OUT_OF_RANGE` (`elbow.radius`) for a short radius below NPS 1 or a
 *   radius not above half the OD; `OUT_OF_RANGE` (`elbow.bendDeg`) outside
 *   0..180°; `BAD_CHOICE` (`elbow.radius`) for another word.
 * @example resolveElbowSpec({ pipe: { odMm: 219.075, wallMm: 8.179, npsIn: 8 } }).bendRadiusMm // 304.8 (12 in)
 */
export function resolveElbowSpec(spec: ElbowSpec): ResolvedElbowSpec {
  if (spec === null || typeof spec !== 'object') throw new GirthError('EMPTY_INPUT', 'elbow', 'elbow: give the elbow pipe, radius and bend', spec);
  const pipe = resolvePipeSection(spec.pipe, 'elbow');
  const bendDeg = spec.bendDeg === undefined ? 90 : requireWithin(spec.bendDeg, 'elbow.bendDeg', BEND_DEG);
  const given = spec.radius ?? 'long';
  let bendRadiusMm: number;
  let radiusKind: ResolvedElbowSpec['radiusKind'];
  if (given === 'long' || given === 'short') {
    const nps = pipe.npsIn;
    if (nps === undefined) {
      throw new GirthError('MISSING_INPUT', 'elbow.radius', `elbow.radius: a ${given} radius elbow is sized from the nominal pipe size; name the pipe by NPS or give the radius`, given);
    }
    if (given === 'short' && nps < 1) {
      throw new GirthError('OUT_OF_RANGE', 'elbow.radius', `elbow.radius: short radius elbows start at NPS 1 (ASME B16.9, recalled); give the radius`, nps);
    }
    const inches = given === 'long' ? (nps < 0.75 ? LONG_RADIUS_NPS_HALF_IN : LONG_RADIUS_PER_NPS * nps) : SHORT_RADIUS_PER_NPS * nps;
    bendRadiusMm = inches * MM_PER_IN;
    radiusKind = given;
  } else if (typeof given === 'number') {
    bendRadiusMm = requirePositive(given, 'elbow.radius');
    radiusKind = 'custom';
  } else {
    throw new GirthError('BAD_CHOICE', 'elbow.radius', `elbow.radius: must be 'long', 'short' or a radius in mm, got ${JSON.stringify(given)}`, given);
  }
  if (!(bendRadiusMm > pipe.odMm / 2)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'elbow.radius',
      `elbow.radius: the centreline radius ${formatLengthBoth(bendRadiusMm)} must be above half the OD, ${formatLengthBoth(pipe.odMm / 2)}`,
      bendRadiusMm,
    );
  }
  const radiusWords = radiusKind === 'custom' ? `${formatLengthBoth(bendRadiusMm)} radius` : `${radiusKind} radius`;
  const label = `${pipe.label} ${Number(bendDeg.toFixed(3))}° ${radiusWords} elbow`;
  return { kind: 'elbow-spec', pipe, radiusKind, bendRadiusMm, bendDeg, label };
}

/**
 * The elbow body's surface at tube radius `tubeRadiusMm` (ID / 2 for the
 * inside, OD / 2 for the outside), in the elbow's frame: bend centre at the
 * origin, bend axis +z, inlet end at +x, the bend turning toward +y.
 * @example elbowSurface(resolveElbowSpec(spec), spec.pipe.odMm / 2) // the outside
 */
export function elbowSurface(elbow: ResolvedElbowSpec, tubeRadiusMm: number): TorusSurface {
  return { kind: 'torus', centre: [0, 0, 0], axisDirection: [0, 0, 1], zeroDirection: [1, 0, 0], bendRadiusMm: elbow.bendRadiusMm, tubeRadiusMm };
}
