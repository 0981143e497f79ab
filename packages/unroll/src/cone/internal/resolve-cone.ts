/**
 * Checks a reducer spec and its options and turns them into the 3D cone.
 */
import {
  coneApexAngleDeg,
  coneLengthFromApexAngle,
  elementInclinationRad,
  makeConeFrustum,
  makeConeSheet,
  type ConeForm,
  type ConeFrustum,
  type ConeSheet,
  type DiameterSurface,
} from '@girth/geometry';
import {
  CHORD_TOLERANCE_MM,
  CONE_APEX_ANGLE_DEG,
  DEFAULT_STATIONS,
  DIAMETER_MM,
  GirthError,
  PLATE_MM,
  REDUCER_STEP_MM,
  requireInteger,
  requirePositive,
  requireWithin,
  STATIONS,
} from '@girth/pipes';
import type { ConeLayoutOptions, ConeSpec, EccentricConeOptions, EccentricSeam } from '../types.js';

/** Fewest stations around a cone: 4, one every 90°. */
export const CONE_MIN_STATIONS = STATIONS.min;
/** Most stations around a cone: 360, one every degree. */
export const CONE_MAX_STATIONS = STATIONS.max;
/** Stations when none are asked for: 16 of 22.5°, as the trade divides a girth (common practice). */
export const CONE_DEFAULT_STATIONS = DEFAULT_STATIONS;

/** A reducer ready to lay out. Lengths in mm. */
export interface ResolvedCone {
  readonly form: ConeForm;
  readonly largeDiameterMm: number;
  readonly smallDiameterMm: number;
  readonly lengthMm: number;
  readonly apexAngleDeg: number;
  readonly maxInclinationDeg: number;
  readonly thicknessMm: number;
  readonly diametersAt: DiameterSurface;
  /** The cone on the surface the diameters were given on. */
  readonly given: ConeFrustum;
  /** Its mean surface, the one developed. */
  readonly sheet: ConeSheet;
  readonly stations: number;
  readonly segments: number;
  readonly largeLabel: string;
  readonly smallLabel: string;
}

/**
 * Default name of a reducer end given by its diameter: two decimals in mm.
 * @example formatMm(219.1) // '219.10 mm'
 */
export const formatMm = (mm: number): string => `${mm.toFixed(2)} mm`;

const SURFACE_PREFIX: Readonly<Record<DiameterSurface, string>> = { outside: 'OD', inside: 'ID', mean: 'mean dia.' };

/**
 * The checked reducer of `spec` and `options`, as `form`.
 *
 * @throws GirthError naming the field and the limit: `BAD_JOB` (spec not an
 *   object), `NOT_A_NUMBER`/`NOT_FINITE`/`NEGATIVE` for bad numbers,
 *   `OUT_OF_RANGE` for a diameter outside `DIAMETER_MM`, a small diameter
 *   not at least `REDUCER_STEP_MM` below the large one (field
 *   `smallDiameterMm`), a plate outside `PLATE_MM`, an apex angle outside
 *   `CONE_APEX_ANGLE_DEG` (field `lengthMm` when the length gave it; limits in `@girth/pipes`), stations outside
 *   4..360 or segments outside 1..stations; `MISSING_INPUT` for neither length nor angle; `BAD_OPTION` for both of
 *   length and angle, segments that do not divide the stations, or a
 *   label/formatter of the wrong type; `BAD_CHOICE` for an unknown
 *   `diametersAt`; `WALL_TOO_THICK` for a
 *   plate too thick for the small end (see `maxPlateThicknessMm`).
 * @example resolveCone({ largeDiameterMm: 219.1, smallDiameterMm: 168.3, lengthMm: 152, thicknessMm: 6 }, {}, 'concentric').lengthMm // 152
 */
export function resolveCone(spec: ConeSpec, options: ConeLayoutOptions, form: ConeForm): ResolvedCone {
  if (typeof spec !== 'object' || spec === null) {
    throw new GirthError('BAD_JOB', 'spec', 'spec: expected the reducer as an object with its diameters, length or angle, and plate thickness', spec);
  }
  /** Lengths in error messages, mm to 0.01 (the describe step words templates; errors are not templates). */
  const formatLength = formatMm;
  const largeDiameterMm = requirePositive(spec.largeDiameterMm, 'largeDiameterMm');
  const smallDiameterMm = requirePositive(spec.smallDiameterMm, 'smallDiameterMm');
  requireWithin(largeDiameterMm, 'largeDiameterMm', { ...DIAMETER_MM, what: 'the large end' }, formatLength);
  requireWithin(smallDiameterMm, 'smallDiameterMm', { ...DIAMETER_MM, what: 'the small end' }, formatLength);
  if (!(smallDiameterMm < largeDiameterMm)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'smallDiameterMm',
      `smallDiameterMm: the small end (${formatLength(smallDiameterMm)}) must be smaller than the large end (${formatLength(largeDiameterMm)})`,
      spec.smallDiameterMm,
    );
  }
  requireWithin(largeDiameterMm - smallDiameterMm, 'smallDiameterMm', REDUCER_STEP_MM, formatLength);
  const diffMm = largeDiameterMm - smallDiameterMm;
  const hasLength = spec.lengthMm !== undefined;
  const hasAngle = spec.apexAngleDeg !== undefined;
  if (hasLength && hasAngle) {
    throw new GirthError('BAD_OPTION', 'apexAngleDeg', 'apexAngleDeg: give the length or the apex angle, not both', spec.apexAngleDeg);
  }
  if (!hasLength && !hasAngle) {
    throw new GirthError('MISSING_INPUT', 'lengthMm', 'lengthMm: give the length between the ends along the axis, or the apex angle', undefined);
  }
  const lengthMm = hasLength
    ? requirePositive(spec.lengthMm, 'lengthMm')
    : coneLengthFromApexAngle(diffMm, spec.apexAngleDeg as number, form);
  const apexAngleDeg = coneApexAngleDeg(diffMm, lengthMm, form);
  requireWithin(apexAngleDeg, hasLength ? 'lengthMm' : 'apexAngleDeg', {
    ...CONE_APEX_ANGLE_DEG,
    what: hasLength ? `the included angle these ends and length give (${formatLength(diffMm)} difference over ${formatLength(lengthMm)})` : 'the included angle',
  });

  const diametersAt = spec.diametersAt ?? 'outside';
  const R = largeDiameterMm / 2;
  const r = smallDiameterMm / 2;
  const given = makeConeFrustum({ largeRadiusMm: R, smallRadiusMm: r, lengthMm, offsetMm: form === 'eccentric' ? R - r : 0 });
  const sheet = makeConeSheet(given, spec.thicknessMm, diametersAt);
  requireWithin(sheet.thicknessMm, 'thicknessMm', PLATE_MM, formatLength);
  const maxInclinationDeg = (elementInclinationRad(given, Math.PI) * 180) / Math.PI;

  const stations = requireWithin(options.stations ?? CONE_DEFAULT_STATIONS, 'stations', STATIONS);
  const segments = requireInteger(options.segments ?? 1, 'segments', 1, stations);
  if (stations % segments !== 0) {
    throw new GirthError(
      'BAD_OPTION',
      'segments',
      `segments: ${stations} stations do not divide into ${segments} equal pieces; choose a station count that is a multiple of ${segments}`,
      options.segments,
    );
  }
  const label = (value: unknown, field: string, diameterMm: number): string => {
    if (value === undefined) return `${SURFACE_PREFIX[diametersAt]} ${formatMm(diameterMm)}`;
    if (typeof value !== 'string' || value.trim() === '') {
      throw new GirthError('BAD_OPTION', field, `${field}: expected a pipe name as text`, value);
    }
    return value;
  };
  return {
    form,
    largeDiameterMm,
    smallDiameterMm,
    lengthMm,
    apexAngleDeg,
    maxInclinationDeg,
    thicknessMm: sheet.thicknessMm,
    diametersAt,
    given,
    sheet,
    stations,
    segments,
    largeLabel: label(spec.largeLabel, 'largeLabel', largeDiameterMm),
    smallLabel: label(spec.smallLabel, 'smallLabel', smallDiameterMm),
  };
}

/** Default chord tolerance of an eccentric cone's outline, mm: far inside what a fitter can mark or cut. */
export const CONE_DEFAULT_CHORD_TOLERANCE_MM = 0.05;
/** Smallest chord tolerance accepted, mm (1 µm; finer only multiplies points). */
export const CONE_MIN_CHORD_TOLERANCE_MM = CHORD_TOLERANCE_MM.min;
/** Largest chord tolerance accepted, mm (a rough sketch; a cut needs far less). */
export const CONE_MAX_CHORD_TOLERANCE_MM = CHORD_TOLERANCE_MM.max;

/**
 * The eccentric-only options, checked.
 * @throws GirthError `BAD_CHOICE` for an unknown seam, `OUT_OF_RANGE` for a chord tolerance outside 0.001..5 mm.
 * @example resolveEccentricOptions({}).seam // 'flat-side'
 */
export function resolveEccentricOptions(options: EccentricConeOptions): { readonly seam: EccentricSeam; readonly chordToleranceMm: number } {
  const seam = options.seam ?? 'flat-side';
  if (seam !== 'flat-side' && seam !== 'opposite') {
    throw new GirthError('BAD_CHOICE', 'seam', `seam: must be 'flat-side' or 'opposite', got ${String(seam)}`, seam);
  }
  const chordToleranceMm = requireWithin(options.chordToleranceMm ?? CONE_DEFAULT_CHORD_TOLERANCE_MM, 'chordToleranceMm', CHORD_TOLERANCE_MM);
  return { seam, chordToleranceMm };
}
