/**
 * Test oracle for a pipe end cut to meet a plane, written from the stated
 * conventions alone and not from the library's code:
 *
 * - The pipe axis runs along +x toward the plane and crosses the plane at the
 *   origin. The plane makes the angle A with the axis: its normal toward the
 *   pipe is `n = (-sin A, 0, -cos A)`, so A = 90° is a square cut.
 * - Heel (phi = 0) toward +z: that generator meets the plane first, at
 *   x = -r cot A (the shortest, the short side); phi grows toward +y. A plane
 *   cut is symmetric about the heel-toe plane, so which way phi runs does not
 *   change any ordinate.
 * - The generators of the fit surface (OD/2, or ID/2 for `id`) are cut; a root
 *   gap g moves the surface they are cut to by g along `n` (the gap measured
 *   square to the plane).
 * - `s` is the position along +x where a generator is cut (its reach toward
 *   the plane); the long point is the largest s over the girth, found by
 *   search; cutback = s(long point) - s(phi) >= 0.
 * - The template wraps on the OD: girth = (OD/2) phi.
 *
 * Every cut is found by {@link cutGeneratorAgainstPlane} (bracketing and
 * bisection to full double precision), never by a closed form.
 */
import { stationAngleDeg, type OraclePipe } from './branch-oracle.js';
import { cutGeneratorAgainstPlane, type OracleLine, type OraclePlane } from './generator-cut.js';
import { maximiseAroundGirth, type GirthExtreme } from './girth-extreme.js';
import { combine, scale, type Vec3 } from './vec3.js';

/** A plane cut, in the same shape as the library's input so one object feeds both. */
export interface OraclePlaneCutSpec {
  readonly pipe: OraclePipe;
  /** Angle between the pipe axis and the plane, degrees, (0, 90]. */
  readonly angleDeg: number;
  /** Root gap square to the plane, mm; default 0. */
  readonly gapMm?: number;
  /** Which pipe surface is cut by the plane; default `od`. */
  readonly fitSurface?: 'od' | 'id';
}

/** The oracle's set-up of a plane cut: pipe frame, the plane, and the surface the generators are cut to. */
export interface PlaneCutFrame {
  readonly kind: 'plane-cut-frame';
  /** Where the pipe axis crosses the plane, mm. */
  readonly axisPointMm: Vec3;
  /** Unit axis direction, from the pipe body toward the plane. */
  readonly axis: Vec3;
  /** Unit direction of phi = 0 (the heel). */
  readonly heel: Vec3;
  /** Unit direction of phi = 90°. */
  readonly side: Vec3;
  /** The plane itself (through the axis point), unit normal toward the pipe. */
  readonly plane: OraclePlane;
  /** The plane moved toward the pipe by the root gap: what the generators are cut to. */
  readonly host: OraclePlane;
}

/** One station of the plane cut, exact. */
export interface ExactPlaneCutStation {
  readonly n: number;
  readonly angleDeg: number;
  readonly phiRad: number;
  /** Arc length around the OD from the heel, mm. */
  readonly girthMm: number;
  /** Reach of the cut along the axis toward the plane, mm. */
  readonly sMm: number;
  /** From the square line through the long point back to the cut, mm (>= 0). */
  readonly cutbackMm: number;
}

/**
 * The oracle's frame of a plane cut.
 * @param spec `angleDeg` in (0, 90], `gapMm` >= 0.
 * @example planeCutFrame({ pipe: { odMm: 100, wallMm: 5 }, angleDeg: 90 }).plane.normal // [-1, 0, -0]
 */
export function planeCutFrame(spec: OraclePlaneCutSpec): PlaneCutFrame {
  const a = (spec.angleDeg * Math.PI) / 180;
  const normal: Vec3 = [-Math.sin(a), 0, -Math.cos(a)];
  const origin: Vec3 = [0, 0, 0];
  return {
    kind: 'plane-cut-frame',
    axisPointMm: origin,
    axis: [1, 0, 0],
    heel: [0, 0, 1],
    side: [0, 1, 0],
    plane: { kind: 'plane', pointMm: origin, normal },
    host: { kind: 'plane', pointMm: scale(normal, spec.gapMm ?? 0), normal },
  };
}

/**
 * Radius of the generators the plane cuts: OD/2, or ID/2 = OD/2 - wall for `id` (mm).
 * @example planeCutFitRadiusMm({ pipe: { odMm: 100, wallMm: 5 }, angleDeg: 60, fitSurface: 'id' }) // 45
 */
export function planeCutFitRadiusMm(spec: OraclePlaneCutSpec): number {
  return (spec.fitSurface ?? 'od') === 'id' ? spec.pipe.odMm / 2 - spec.pipe.wallMm : spec.pipe.odMm / 2;
}

/**
 * The generator of radius `radiusMm` at `phiRad`, starting in the cross-section through the axis point, running toward the plane.
 * @example planeCutGenerator(planeCutFrame(spec), 50, 0).originMm // [0, 0, 50]
 */
export function planeCutGenerator(frame: PlaneCutFrame, radiusMm: number, phiRad: number): OracleLine {
  return {
    kind: 'line',
    originMm: combine([
      [1, frame.axisPointMm],
      [radiusMm * Math.cos(phiRad), frame.heel],
      [radiusMm * Math.sin(phiRad), frame.side],
    ]),
    direction: frame.axis,
  };
}

/**
 * Reach `s` (mm along the axis toward the plane) where the generator at `phiRad` is cut.
 * @param radiusMm generator radius; default the fit radius; 0 gives the pipe axis.
 * @throws Error when the generator runs parallel to the plane (angle 0, outside the valid range).
 * @example planeCutS({ pipe: { odMm: 100, wallMm: 5 }, angleDeg: 45 }, 0) // ≈ -50 (heel)
 */
export function planeCutS(spec: OraclePlaneCutSpec, phiRad: number, radiusMm: number = planeCutFitRadiusMm(spec)): number {
  const frame = planeCutFrame(spec);
  const cut = cutGeneratorAgainstPlane(planeCutGenerator(frame, radiusMm, phiRad), frame.host);
  if (cut.kind === 'miss') throw new Error(`plane-cut oracle: the generator at ${phiRad} rad does not meet the plane (${cut.reason})`);
  return cut.sMm;
}

/**
 * The long point: the generator of the fit surface that reaches furthest toward the plane, found by search.
 * @example planeCutLongPoint(spec).phiRad // ≈ π
 */
export function planeCutLongPoint(spec: OraclePlaneCutSpec): GirthExtreme {
  return maximiseAroundGirth((phi) => planeCutS(spec, phi));
}

/**
 * Cutback (mm) of the fit-surface generator at `phiRad` from the square line through `longPoint`.
 * @example planeCutCutbackMm(spec, Math.PI, planeCutLongPoint(spec)) // ≈ 0
 */
export function planeCutCutbackMm(spec: OraclePlaneCutSpec, phiRad: number, longPoint: GirthExtreme): number {
  return longPoint.value - planeCutS(spec, phiRad);
}

/**
 * The exact stations of the plane cut, `count` equal stations from the heel.
 * @param longPoint the reference for cutbacks; searched for when not given.
 * @example exactPlaneCutStations(spec, 16)[8]?.cutbackMm // ≈ 0 (the long point)
 */
export function exactPlaneCutStations(spec: OraclePlaneCutSpec, count: number, longPoint: GirthExtreme = planeCutLongPoint(spec)): readonly ExactPlaneCutStation[] {
  const wrapRadiusMm = spec.pipe.odMm / 2;
  return Array.from({ length: count }, (_, i) => {
    const angleDeg = stationAngleDeg(i + 1, count);
    const phiRad = (angleDeg * Math.PI) / 180;
    const sMm = planeCutS(spec, phiRad);
    return { n: i + 1, angleDeg, phiRad, girthMm: wrapRadiusMm * phiRad, sMm, cutbackMm: longPoint.value - sMm };
  });
}

/**
 * From the square line through the long point back to where the pipe axis meets the cut, mm.
 * @example planeCutAxisCutbackMm({ pipe: { odMm: 100, wallMm: 5 }, angleDeg: 45 }) // ≈ 50
 */
export function planeCutAxisCutbackMm(spec: OraclePlaneCutSpec, longPoint: GirthExtreme = planeCutLongPoint(spec)): number {
  return longPoint.value - planeCutS(spec, 0, 0);
}

/**
 * How far the root gap moves the cut back along the axis: the axis's reach without the gap minus with it, mm.
 * @example planeCutGapSetbackMm({ pipe: { odMm: 100, wallMm: 5 }, angleDeg: 90, gapMm: 3 }) // ≈ 3
 */
export function planeCutGapSetbackMm(spec: OraclePlaneCutSpec): number {
  return planeCutS({ ...spec, gapMm: 0 }, 0, 0) - planeCutS(spec, 0, 0);
}
