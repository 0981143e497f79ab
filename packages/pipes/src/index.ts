/**
 * @girth/pipes: the pipe catalog (ASME B36.10M, B36.19M, EN 10220), pipe names
 * as fitters write them, lengths (parse, convert, format), and the one error
 * type every Girth package throws.
 *
 * The public surface is this list, by name: modules inside may move or split
 * without changing it. Anything not named here is internal.
 *
 * @packageDocumentation
 * @module @girth/pipes
 */

// Errors and warnings
export { GirthError, isGirthError } from './errors.js';
export type { GirthErrorCode, GirthWarning } from './errors.js';

// Input checks that throw GirthError (shared by every layer)
export { requireFinite, requirePositive, requireNonNegative, requireInRange, requireInteger } from './validate.js';

// Lengths: units, parsing, formatting
export {
  inchesToMm,
  mmToInches,
  lengthToMm,
  mmToLength,
  MM_PER_INCH,
  INCHES_PER_FOOT,
  MM_PER_FOOT,
  MM_PER_WRITTEN_UNIT,
} from './length/units.js';
export type { LengthUnit, LengthFormat, WrittenLengthUnit } from './length/units.js';
export { ACCEPTED_UNIT_NAMES } from './length/unit-names.js';
export { roundToFraction, feetInchParts, FRACTION_DENOMINATORS } from './length/fraction.js';
export type { FractionDenominator, FeetInchParts } from './length/fraction.js';
export { parseLength } from './length/parse.js';
export type { ParseLengthOptions } from './length/parse.js';
export { formatLength } from './length/format.js';
export type { FormatLengthOptions } from './length/format.js';
export { formatLengthBoth, formatAngleDeg } from './length/format-both.js';

// The pipe catalog
export type { B3610mSchedule, B3619mSchedule, B3610mSize, B3619mSize, En10220Size } from './catalog/types.js';
export { npsDesignationValue } from './catalog/nps.js';
export { ASME_B36_10M } from './catalog/asme-b36-10m.js';
export { ASME_B36_19M } from './catalog/asme-b36-19m.js';
export { EN_10220 } from './catalog/en-10220.js';
export {
  findB3610mSize,
  findB3610mSizeByDn,
  findB3619mSize,
  findEn10220Size,
  B36_10M_SCHEDULE_ORDER,
  B36_19M_SCHEDULE_ORDER,
} from './catalog/lookup.js';

// Pipes: resolving names and dimensions
export type { PipeStandard, Pipe } from './pipe/types.js';
export { pipeFromDimensions } from './pipe/from-dimensions.js';
export type { PipeFromDimensionsOptions } from './pipe/from-dimensions.js';
export { resolvePipe, PIPE_NAME_EXAMPLES } from './pipe/resolve.js';
export type { ResolvePipeOptions } from './pipe/resolve.js';
export { schedulesFor, pipesForNps, npsSizes, dnSizes } from './pipe/schedules-for.js';

// Added in this wave: host surfaces, limits, weld preparation, fit-up, typed templates and their wording.
export { ERROR_CODES } from './codes.js';
export { BEND_DEG, CHORD_TOLERANCE_MM, CONE_APEX_ANGLE_DEG, DEFAULT_STATIONS, DIAMETER_MM, HEAD_RATIO, JOINT_ANGLE_DEG, LENGTH_MM, LIMITS, MITER_WELDS, NOZZLE_TILT_DEG, PLATE_MM, REDUCER_STEP_MM, SHALLOW_CONE_WARN_DEG, STATIONS, TEMPLATE_REACH_MM, WALL_MM, formatPair, isWithin, rangeText, requireWithin } from './limits.js';
export type { Limit } from './limits.js';
export { CAUTION } from './caution.js';
