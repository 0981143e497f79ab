/**
 * Checking an angle with a tape and a square, without a protractor.
 */
import { GirthError, requireFinite, requirePositive } from '@girth/pipes';

/** Default run along the header (and radius of the chord check): one foot, mm. Callers in mm jobs pass a round number of their own. */
export const DEFAULT_CHECK_LENGTH_MM = 304.8;

/** Longest run, chord radius or unit an angle check accepts, mm (1 km): beyond it the input is a slip, and the rise could overflow. */
export const MAX_CHECK_LENGTH_MM = 1e6;

/** Radius, in units, on which one unit of arc spans one degree: 180/π ≈ 57.3 (common practice). */
export const ARC_RADIUS_UNITS_PER_DEGREE = 180 / Math.PI;

/** Options of {@link angleCheck}. All lengths mm, each > 0. */
export interface AngleCheckOptions {
  /** Run measured along the reference line (the header), mm; default {@link DEFAULT_CHECK_LENGTH_MM}. */
  readonly runMm?: number;
  /** Distance from the vertex to each of the two marks of the chord check, mm; default {@link DEFAULT_CHECK_LENGTH_MM}. */
  readonly chordRadiusMm?: number;
  /** Length of one unit of the job (25.4 for inches, 1 for millimetres), mm; default 25.4. */
  readonly arcUnitMm?: number;
}

/**
 * How to check one angle A with a tape and a square. Lengths in mm (print
 * them in the job's unit). The vertex is where the two lines meet (for a
 * branch, where its centreline crosses the header's top or offset line).
 */
export interface AngleCheck {
  readonly kind: 'angle-check';
  /** The angle checked, degrees, in (0, 180). */
  readonly angleDeg: number;
  /** Run along the reference line from the vertex, mm. */
  readonly runMm: number;
  /**
   * Rise of the other line, square to the reference line, at the end of the
   * run: run × tan A, mm. Left out at 90° and above (the line stands square:
   * check it with a square).
   */
  readonly riseMm?: number;
  /** Distance from the vertex to a mark on each line, mm. */
  readonly chordRadiusMm: number;
  /** Straight distance between the two marks: 2 × radius × sin(A/2), mm. */
  readonly chordMm: number;
  /** One unit of the job, mm. */
  readonly arcUnitMm: number;
  /** 180/π units (≈ 57.3) in mm: on this radius one unit of arc spans one degree. */
  readonly arcRadiusMm: number;
  /** Arc between the lines on that radius: A units, mm (tape round a trammel arc). */
  readonly arcLengthMm: number;
}

/**
 * The tape-and-square checks of angle A between two lines meeting at a vertex:
 * rise over a run (rise = run × tan A), the chord between two marks at one
 * radius (2 L sin(A/2)), and the arc on a radius of 180/π ≈ 57.3 units, where
 * one unit of arc is one degree (common practice).
 *
 * @param angleDeg the angle, degrees, in (0, 180) (between branch and header: (0, 90]).
 * @throws GirthError `OUT_OF_RANGE` (field `angleDeg`) outside (0, 180);
 *   `NEGATIVE` (field `runMm`, `chordRadiusMm` or `arcUnitMm`) for a length of zero or below,
 *   `OUT_OF_RANGE` for one over {@link MAX_CHECK_LENGTH_MM};
 *   `NOT_A_NUMBER` / `NOT_FINITE` naming the option.
 * @example angleCheck(45, { runMm: 300 }).riseMm // 300 (tan 45° = 1)
 */
export function angleCheck(angleDeg: number, options: AngleCheckOptions = {}): AngleCheck {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { runMm, chordRadiusMm, arcUnitMm }', options);
  }
  const a = requireFinite(angleDeg, 'angleDeg');
  if (!(a > 0 && a < 180)) {
    throw new GirthError('OUT_OF_RANGE', 'angleDeg', `angleDeg: an angle to check must be between 0° and 180°, got ${a}°`, angleDeg);
  }
  const runMm = checkLength(options.runMm, 'runMm', DEFAULT_CHECK_LENGTH_MM);
  const chordRadiusMm = checkLength(options.chordRadiusMm, 'chordRadiusMm', DEFAULT_CHECK_LENGTH_MM);
  const arcUnitMm = checkLength(options.arcUnitMm, 'arcUnitMm', 25.4);
  const rad = (a * Math.PI) / 180;
  return {
    kind: 'angle-check',
    angleDeg: a,
    runMm,
    ...(a < 90 ? { riseMm: runMm * Math.tan(rad) } : {}),
    chordRadiusMm,
    chordMm: 2 * chordRadiusMm * Math.sin(rad / 2),
    arcUnitMm,
    arcRadiusMm: ARC_RADIUS_UNITS_PER_DEGREE * arcUnitMm,
    arcLengthMm: ARC_RADIUS_UNITS_PER_DEGREE * arcUnitMm * rad,
  };
}

function checkLength(value: unknown, field: string, fallback: number): number {
  if (value === undefined) return fallback;
  const v = requirePositive(value, field);
  if (v > MAX_CHECK_LENGTH_MM) {
    throw new GirthError('OUT_OF_RANGE', field, `${field}: must be at most ${MAX_CHECK_LENGTH_MM} mm (1 km), got ${v} mm`, value);
  }
  return v;
}
