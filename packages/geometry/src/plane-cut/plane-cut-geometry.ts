/**
 * A pipe end cut to meet a plane: the generator bundle and the plane it meets.
 */
import { JOINT_ANGLE_DEG, requireNonNegative, requireWithin, type GirthWarning } from '@girth/pipes';
import { intersectLine, offsetSurface } from '../surfaces/line-intersection.js';
import type { GeneratorBundle, PlaneSurface } from '../types.js';
import { addScaled, type Vec3 } from '../vec3.js';
import { fitRadiusMm, type CutFitSurface } from './fit-surface.js';
import { SHALLOW_PLANE_CUT_WARN_DEG } from './limits.js';
import { resolvePipeSection } from '../pipe-section.js';
import type { PlaneCutGeometry, PlaneCutSpec } from './types.js';

const AXIS: Vec3 = [1, 0, 0];
const HEEL: Vec3 = [0, 0, 1];
const SIDE: Vec3 = [0, 1, 0];
const ORIGIN: Vec3 = [0, 0, 0];

/**
 * Sets up a plane cut in 3D: checks the input, builds the generator bundle of
 * the fit surface and the plane (moved toward the pipe by the root gap).
 * The cut itself comes from intersecting the bundle's generators with `host`
 * (see `hitGenerator`).
 *
 * @param spec pipe, `angleDeg` in [1, 90] (see MIN_JOINT_ANGLE_DEG) between the axis and the plane, optional
 *   `gapMm` ≥ 0 and `fitSurface` (`od` by default).
 * @throws GirthError `OUT_OF_RANGE` for an angle outside [1, 90] (MIN_JOINT_ANGLE_DEG); `NEGATIVE` for a
 *   negative gap; `NOT_A_NUMBER`/`NOT_FINITE` for NaN or Infinity; `BAD_OPTION` for
 *   an unknown fit surface; the pipe errors of {@link resolvePipeSection}.
 * @example planeCutGeometry({ pipe: { odMm: 168.3, wallMm: 7.11 }, angleDeg: 60 }).cutAngleDeg // 30
 */
export function planeCutGeometry(spec: PlaneCutSpec): PlaneCutGeometry {
  const pipe = resolvePipeSection(spec.pipe);
  const angleDeg = requireWithin(spec.angleDeg, 'angleDeg', JOINT_ANGLE_DEG);
  const gapMm = spec.gapMm === undefined ? 0 : requireNonNegative(spec.gapMm, 'gapMm');
  const fitSurface: CutFitSurface = spec.fitSurface ?? 'od';
  const radius = fitRadiusMm(pipe, fitSurface);

  const angleRad = (angleDeg * Math.PI) / 180;
  // The plane contains the side direction and leans so the heel (+z) meets it first.
  const normal: Vec3 = angleDeg === 90 ? [-1, 0, 0] : [-Math.sin(angleRad), 0, -Math.cos(angleRad)];
  const plane: PlaneSurface = { kind: 'plane', point: ORIGIN, normal };
  const host = offsetSurface(plane, gapMm) as PlaneSurface;
  const bundle: GeneratorBundle = { radius, axisPoint: ORIGIN, axisDirection: AXIS, heelDirection: HEEL, sideDirection: SIDE };

  const axisLine = { origin: ORIGIN, direction: AXIS };
  const onPlane = intersectLine(plane, axisLine)[0] ?? 0;
  const onHost = intersectLine(host, axisLine)[0] ?? 0;

  const warnings: GirthWarning[] = [];
  if (angleDeg < SHALLOW_PLANE_CUT_WARN_DEG) {
    warnings.push({
      code: 'SHALLOW_PLANE_CUT',
      field: 'angleDeg',
      message: `a cut at ${angleDeg}° to the plane runs out into a feather edge ${(1 / Math.tan(angleRad)).toFixed(1)} diameters long; check it can be cut, fitted and welded`,
    });
  }

  return {
    kind: 'plane-cut-geometry',
    pipe,
    angleDeg,
    cutAngleDeg: 90 - angleDeg,
    gapMm,
    fitSurface,
    fitRadiusMm: radius,
    bundle,
    plane,
    host,
    axisOnPlane: addScaled(ORIGIN, AXIS, onPlane),
    gapSetbackMm: onPlane - onHost,
    warnings,
  };
}
