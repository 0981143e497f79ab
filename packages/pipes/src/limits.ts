/**
 * The bounds Girth accepts, in one place: the library checks against them, the
 * command line prints them in its help and the job-file schema is built from
 * them. Each bound carries its unit and the physical reason for it, and
 * {@link requireWithin} throws the one error for any value outside one
 * (`OUT_OF_RANGE`, naming the field, the value and the limit).
 */
import { GirthError } from './errors.js';
import { requireFinite } from './validate.js';

/** One accepted range: `[min, max]`, each end open when so marked. */
export interface Limit {
  /** Smallest accepted value, in `unit`. */
  readonly min: number;
  /** Largest accepted value, in `unit`. */
  readonly max: number;
  /** True when `min` itself is refused (the value must be above it). */
  readonly minOpen?: boolean;
  /** True when `max` itself is refused. */
  readonly maxOpen?: boolean;
  /** True when only whole numbers are accepted. */
  readonly integer?: boolean;
  /** The unit of `min` and `max` as printed: `mm`, `°`, or `''` for a count. */
  readonly unit: 'mm' | '°' | '';
  /** What the value is, in the trade's words: `the number of stations`. */
  readonly what: string;
  /** Why the bound is where it is, printed after the limit. */
  readonly reason: string;
}

/**
 * Stations around a girth: at least 4 (one every 90°, the fewest that still
 * fix a curve's high and low points), at most 360 (one every degree; more
 * lines than a fitter can mark on any pipe Girth lays out).
 */
export const STATIONS: Limit = {
  min: 4,
  max: 360,
  integer: true,
  unit: '',
  what: 'the number of stations',
  reason: 'at least one every 90° and at most one every degree',
};

/** Default stations around a girth: 16 of 22.5°, as the trade divides a girth (common practice). */
export const DEFAULT_STATIONS = 16;

/**
 * Chord tolerance of a sampled outline, mm: 1 µm (finer only multiplies
 * points) to 5 mm (a rough sketch; a cut needs far less).
 */
export const CHORD_TOLERANCE_MM: Limit = {
  min: 0.001,
  max: 5,
  unit: 'mm',
  what: 'the chord tolerance',
  reason: 'finer than 1 µm only adds points, coarser than 5 mm no longer follows the curve',
};

/**
 * Angle between a cut pipe's axis and what it meets (a branch's header, a
 * cut-back's plane), degrees: 1 to 90. At 1° the cut already runs out about 57
 * diameters along the pipe (cot 1°); below it the numbers stop meaning
 * anything a shop can cut.
 */
export const JOINT_ANGLE_DEG: Limit = {
  min: 1,
  max: 90,
  unit: '°',
  what: 'the angle between the axes',
  reason: '90° is square; below 1° the cut runs out more than 57 diameters along the pipe',
};

/**
 * Ratio of an ellipsoidal head, its inside diameter to twice its inside
 * depth (2 for the common 2:1 head, ASME Section VIII Div. 1 UG-32(d), recalled):
 * 1 (a hemisphere) to 4 (flatter heads are dished heads of another shape).
 */
export const HEAD_RATIO: Limit = {
  min: 1,
  max: 4,
  unit: '',
  what: 'the head ratio (inside diameter to twice the inside depth)',
  reason: '1 is a hemisphere; flatter than 4:1 is not an ellipsoidal head the trade forms',
};

/**
 * Tilt of a nozzle's axis from the vessel axis, degrees, positive leaning
 * outboard (away from the head's centre line): −80 to 80. Past 80° the
 * nozzle lies nearly along the head and its hole runs out of all proportion.
 */
export const NOZZLE_TILT_DEG: Limit = {
  min: -80,
  max: 80,
  unit: '°',
  what: "the nozzle's tilt from the vessel axis",
  reason: 'past 80° the nozzle lies nearly along the head',
};

/**
 * Total bend of a miter elbow, degrees: more than 0, at most 180 (a return).
 */
export const BEND_DEG: Limit = {
  min: 0,
  max: 180,
  minOpen: true,
  unit: '°',
  what: 'the bend',
  reason: 'a bend turns the pipe by more than 0° and at most 180° (a return)',
};

/**
 * Outside diameter of a pipe or of a reducer end, mm: 3 mm (the smallest
 * tubing a wrap can still be marked around; the smallest ASME B36.10M pipe,
 * NPS 1/8, is 10.3 mm) to 20 m (beyond any pipe or rolled shell; the largest
 * B36.10M size, NPS 80, is 2032 mm).
 */
export const DIAMETER_MM: Limit = {
  min: 3,
  max: 20_000,
  unit: 'mm',
  what: 'the diameter',
  reason: 'smaller than 3 mm cannot be marked by template, larger than 20 m is beyond any pipe or rolled shell',
};

/**
 * Wall of a pipe, mm: 0.1 mm (thinner than any tube that is cut to a
 * template; thin-wall tube starts near 0.5 mm) to 500 mm; it must also stay
 * below half the OD, checked apart.
 */
export const WALL_MM: Limit = {
  min: 0.1,
  max: 500,
  unit: 'mm',
  what: 'the wall',
  reason: 'thinner than 0.1 mm is foil, not pipe; thicker than 500 mm is beyond any pipe',
};

/**
 * Plate thickness of a rolled reducer, mm: 0 (develop the given surface as
 * it is) to 500 mm; it must also leave the small end open, checked apart.
 */
export const PLATE_MM: Limit = {
  min: 0,
  max: 500,
  unit: 'mm',
  what: 'the plate thickness',
  reason: '0 develops the given surface itself; thicker than 500 mm is beyond any rolled plate',
};

/**
 * How much larger a reducer's large end is than its small end, mm: at least
 * 1 mm. Ends closer than that are within the out-of-roundness allowed on the
 * pipe itself (about 1 % of the OD, recalled), so the piece is a cylinder.
 */
export const REDUCER_STEP_MM: Limit = {
  min: 1,
  max: DIAMETER_MM.max,
  unit: 'mm',
  what: 'the difference between the end diameters',
  reason: 'ends closer than 1 mm are within the out-of-roundness of the pipe itself: roll a cylinder',
};

/**
 * Included (apex) angle of a reducer, degrees: at least 0.5° (flatter than
 * that the pattern is a sliver of a ring hundreds of diameters across) and
 * below 180° (concentric) or 90° (eccentric, the angle at the flat side).
 */
export const CONE_APEX_ANGLE_DEG: Limit = {
  min: 0.5,
  max: 180,
  maxOpen: true,
  unit: '°',
  what: 'the included angle',
  reason: 'flatter than 0.5° the pattern is a sliver of a ring hundreds of diameters across',
};

/**
 * Below this included angle (degrees) a reducer still lays out but gets a
 * warning: its pattern is a long thin ring sector whose radius is more than
 * about 23 times the large diameter (1 / (2 sin 1.25°)).
 */
export const SHALLOW_CONE_WARN_DEG = 2.5;

/** A pipe length Girth lays out (offsets, gaps, tangents, reducer lengths), mm: up to 1 km. */
export const LENGTH_MM: Limit = {
  min: 0,
  max: 1_000_000,
  unit: 'mm',
  what: 'the length',
  reason: 'longer than 1 km is beyond any piece laid out by template',
};

/**
 * Farthest any line or label of a template may lie from its origin, mm (1 km:
 * beyond any sheet, and far from float trouble). Layouts refuse a joint whose
 * template would reach past it; the exporters check the same bound.
 */
export const TEMPLATE_REACH_MM = 1_000_000;

/** Welds in a miter elbow: 1 to 90 (at 90 welds a 180° return is cut 1° a weld). */
export const MITER_WELDS: Limit = {
  min: 1,
  max: 90,
  integer: true,
  unit: '',
  what: 'the number of welds',
  reason: 'a miter has at least one weld; more than 90 is a bend, not a miter',
};

/** Every bound, by name, for the help text and the documentation. */
export const LIMITS = {
  stations: STATIONS,
  chordToleranceMm: CHORD_TOLERANCE_MM,
  jointAngleDeg: JOINT_ANGLE_DEG,
  bendDeg: BEND_DEG,
  diameterMm: DIAMETER_MM,
  wallMm: WALL_MM,
  plateMm: PLATE_MM,
  reducerStepMm: REDUCER_STEP_MM,
  coneApexAngleDeg: CONE_APEX_ANGLE_DEG,
  lengthMm: LENGTH_MM,
  miterWelds: MITER_WELDS,
  headRatio: HEAD_RATIO,
  nozzleTiltDeg: NOZZLE_TILT_DEG,
} as const satisfies Readonly<Record<string, Limit>>;

/** True when `value` is inside `limit`. */
export function isWithin(value: number, limit: Limit): boolean {
  if (!Number.isFinite(value)) return false;
  if (limit.integer === true && !Number.isInteger(value)) return false;
  const aboveMin = limit.minOpen === true ? value > limit.min : value >= limit.min;
  const belowMax = limit.maxOpen === true ? value < limit.max : value <= limit.max;
  return aboveMin && belowMax;
}

/**
 * `value` and `bound` as text, with as many decimals as it takes for them to
 * read differently when they differ (so a message never says "84.9 mm may be
 * at most 84.9 mm"). At most 9 decimals; trailing zeros dropped.
 * @example formatPair(84.93, 84.9) // ['84.93', '84.9']
 */
export function formatPair(value: number, bound: number, decimals = 3): readonly [string, string] {
  const text = (x: number, d: number): string => {
    const s = String(Number(x.toFixed(d)));
    return s === '-0' ? '0' : s;
  };
  let d = decimals;
  while (d < 9 && value !== bound && text(value, d) === text(bound, d)) d += 1;
  // A tiny value never reads as 0 (0.000001 mm is not "0 mm").
  let v = value !== 0 && text(value, d) === '0' ? String(Number(value.toPrecision(3))) : text(value, d);
  // Closer than 9 decimals: every digit there is (500.00000000000006 is above 500).
  if (value !== bound && v === text(bound, d)) v = String(value);
  return [v, text(bound, d)];
}

/** A number with its unit: `12 mm`, `45°`, `16`. */
function withUnit(text: string, unit: Limit['unit']): string {
  return unit === '' ? text : unit === '°' ? `${text}°` : `${text} ${unit}`;
}

/**
 * The range of `limit` in words: `from 4 to 360`, `more than 0° and at most 180°`.
 * @example rangeText(STATIONS) // 'from 4 to 360'
 */
export function rangeText(limit: Limit): string {
  const lo = withUnit(String(limit.min), limit.unit);
  const hi = withUnit(String(limit.max), limit.unit);
  const from = limit.minOpen === true ? `more than ${lo}` : `from ${lo}`;
  const to = limit.maxOpen === true ? `and below ${hi}` : limit.minOpen === true ? `and at most ${hi}` : `to ${hi}`;
  return `${limit.integer === true ? 'a whole number ' : ''}${from} ${to}`;
}

/**
 * The value when it is a finite number inside `limit`.
 *
 * @param value the number as given (any type; non-numbers are refused).
 * @param field the field as the user wrote it, named in the error.
 * @param limit the bound, e.g. {@link STATIONS}.
 * @param shown optional: the value and the bound as the user reads them (for
 *   a length given in inches, say); default the number in `limit.unit`.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` for non-numbers; `OUT_OF_RANGE`
 *   naming the field, the value, the limit and the reason.
 * @example requireWithin(16, 'stations', STATIONS) // 16
 */
export function requireWithin(value: unknown, field: string, limit: Limit, shown?: (mm: number) => string): number {
  const v = requireFinite(value, field);
  if (isWithin(v, limit)) return v;
  const below = limit.minOpen === true ? v <= limit.min : v < limit.min;
  const bound = below ? limit.min : limit.max;
  let got: string;
  let lim: string;
  if (shown !== undefined) {
    got = shown(v);
    lim = shown(bound);
    if (got === lim) [got, lim] = formatPair(v, bound).map((t) => withUnit(t, limit.unit)) as [string, string];
  } else {
    [got, lim] = formatPair(v, bound).map((t) => withUnit(t, limit.unit)) as [string, string];
  }
  const notWhole = limit.integer === true && !Number.isInteger(v) && !below && v <= limit.max;
  const problem = notWhole
    ? `must be a whole number, got ${got}`
    : below
      ? `${limit.what} must be ${limit.minOpen === true ? 'more than' : 'at least'} ${lim}, got ${got}`
      : `${limit.what} must be ${limit.maxOpen === true ? 'below' : 'at most'} ${lim}, got ${got}`;
  throw new GirthError('OUT_OF_RANGE', field, `${field}: ${problem} (${rangeText(limit)}: ${limit.reason})`, value);
}
