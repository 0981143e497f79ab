/**
 * The assembled miter elbow in 3D: piece frames and weld planes.
 */
import { offsetSurface } from '../surfaces/line-intersection.js';
import type { GeneratorBundle, PlaneSurface } from '../types.js';
import { addScaled, scale, type Vec3 } from '../vec3.js';
import { miterWarnings } from './miter-warnings.js';
import { resolveMiterSpec } from './resolve-miter-spec.js';
import type { MiterCutEnd, MiterGeometry, MiterPiece3d, MiterSpec, ResolvedMiterSpec } from './types.js';

const ORIGIN: Vec3 = [0, 0, 0];
const BEND_AXIS: Vec3 = [0, 0, 1];

/** Unit vector in the plane of the bend at `angleRad` from +x toward +y. */
const inPlane = (angleRad: number): Vec3 => [Math.cos(angleRad), Math.sin(angleRad), 0];

/**
 * Lays out a miter elbow in 3D from its spec: every piece's axis and frame and
 * every weld plane. The bend centre is the origin and the bend axis +z; piece k
 * runs at 2 k c from +x (c the cut angle) along the line that touches the bend
 * circle of radius R at R (sin 2kc, −cos 2kc, 0). Weld j contains the bend axis
 * and bisects pieces j−1 and j. Each cut end is a generator bundle aimed at its
 * weld plane; the cuts come from intersecting them (see `hitGenerator`).
 *
 * Both cut ends of a piece share its heel (toward the bend centre: the throat)
 * and its phi = 90° direction (+z), so one station angle names one generator of
 * the piece at both ends.
 *
 * @throws GirthError as {@link resolveMiterSpec}.
 * @example miterGeometry({ pipe: { odMm: 323.9, wallMm: 9.53 }, bendDeg: 90, welds: 3, radiusMm: 457.2 }).pieces.length // 4
 */
export function miterGeometry(spec: MiterSpec): MiterGeometry {
  const resolved = resolveMiterSpec(spec);
  return {
    kind: 'miter-geometry',
    spec: resolved,
    bendCenter: ORIGIN,
    bendAxis: BEND_AXIS,
    weldPlanes: weldPlanes(resolved),
    pieces: Array.from({ length: resolved.pieceCount }, (_, k) => piece3d(resolved, k)),
    warnings: miterWarnings(resolved),
  };
}

function cutRad(spec: ResolvedMiterSpec): number {
  return (spec.cutAngleDeg * Math.PI) / 180;
}

/** Weld j (1-based): through the bend axis, normal along the bisector of pieces j−1 and j. */
function weldPlane(spec: ResolvedMiterSpec, j: number): PlaneSurface {
  return { kind: 'plane', point: ORIGIN, normal: inPlane((2 * j - 1) * cutRad(spec)) };
}

function weldPlanes(spec: ResolvedMiterSpec): readonly PlaneSurface[] {
  return Array.from({ length: spec.welds }, (_, i) => weldPlane(spec, i + 1));
}

/** The plane a piece end is cut to: the weld plane (normal toward the piece) moved half the root gap into the piece. */
function setBack(plane: PlaneSurface, spec: ResolvedMiterSpec): PlaneSurface {
  return spec.gapMm > 0 ? (offsetSurface(plane, spec.gapMm / 2) as PlaneSurface) : plane;
}

function piece3d(spec: ResolvedMiterSpec, k: number): MiterPiece3d {
  const thetaRad = 2 * k * cutRad(spec);
  const direction = inPlane(thetaRad);
  const heelDirection: Vec3 = [-Math.sin(thetaRad), Math.cos(thetaRad), 0];
  const tangentPoint = scale([Math.sin(thetaRad), -Math.cos(thetaRad), 0], spec.radiusMm);
  const bundle = (axisDirection: Vec3): GeneratorBundle => ({
    radius: spec.fitRadiusMm,
    axisPoint: tangentPoint,
    axisDirection,
    heelDirection,
    sideDirection: BEND_AXIS,
  });
  const last = spec.pieceCount - 1;
  let nearCut: MiterCutEnd | undefined;
  let farCut: MiterCutEnd | undefined;
  if (k > 0) {
    const plane = weldPlane(spec, k);
    // The plane's normal points from piece k−1 toward piece k: toward this piece, as a host's must.
    nearCut = { kind: 'miter-cut-end', weld: k, bundle: bundle(scale(direction, -1)), host: setBack(plane, spec) };
  }
  if (k < last) {
    const plane = weldPlane(spec, k + 1);
    farCut = { kind: 'miter-cut-end', weld: k + 1, bundle: bundle(direction), host: setBack({ ...plane, normal: scale(plane.normal, -1) }, spec) };
  }
  const role = k === 0 || k === last ? 'end' : 'middle';
  const squareEndCenter =
    k === 0 ? addScaled(tangentPoint, direction, -spec.tangentMm) : k === last ? addScaled(tangentPoint, direction, spec.tangentMm) : undefined;
  return {
    kind: 'miter-piece',
    index: k,
    role,
    direction,
    heelDirection,
    sideDirection: BEND_AXIS,
    tangentPoint,
    ...(nearCut ? { nearCut } : {}),
    ...(farCut ? { farCut } : {}),
    ...(squareEndCenter ? { squareEndCenter } : {}),
  };
}
