/**
 * The local frame of a cut at one station, and its local dihedral angle.
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator } from '../generators.js';
import { surfaceNormal } from '../surfaces/line-intersection.js';
import type { GeneratorBundle, HostSurface } from '../types.js';
import { addScaled, dot, scale, type Vec3 } from '../vec3.js';
import type { WeldStationFrame } from './types.js';

const DEG = 180 / Math.PI;

/**
 * Local dihedral angle, degrees in [0, 180], between two surfaces that meet
 * along a line, from their normals there: each normal pointing out of its
 * member into the space the weld fills. The tangents of the two surfaces,
 * taken in the plane square to the line and pointing away from it, open by
 * 180° less the angle between the normals (AWS D1.1's definition for
 * tubular connections, recalled: the angle between tangents to the outside
 * surfaces, measured in the plane square to the weld line).
 *
 * @param pipeNormal unit outward normal of the cut pipe.
 * @param hostNormal unit normal of the host, pointing toward the cut pipe's side.
 * @example dihedralDegFromNormals([1, 0, 0], [0, 0, 1]) // 90 (the crown of a tee)
 */
export function dihedralDegFromNormals(pipeNormal: Vec3, hostNormal: Vec3): number {
  const c = Math.max(-1, Math.min(1, -dot(pipeNormal, hostNormal)));
  return Math.acos(c) * DEG;
}

/**
 * The outward normal of the cut pipe along its generator at `phiRad`: the
 * radial direction cos phi · heel + sin phi · side. The same on the OD and
 * the ID (concentric surfaces share normals along a radial line).
 * @example pipeRadialDirection(bundle, 0) // bundle.heelDirection
 */
export function pipeRadialDirection(bundle: GeneratorBundle, phiRad: number): Vec3 {
  return addScaled(scale(bundle.heelDirection, Math.cos(phiRad)), bundle.sideDirection, Math.sin(phiRad));
}

/**
 * The weld frame at station angle `phiRad`: the point where the station's
 * generator of `bundle` meets `host` (the point of the cut line), the two
 * outward normals there and the local dihedral angle.
 *
 * Which surfaces: the normals of a cylinder are the same along a radial line
 * whatever its radius, so the dihedral angle found where the contacting
 * surfaces meet (branch ID on header OD for set-on) is the angle between the
 * tangent planes of the outside surfaces along the same radial lines.
 *
 * @throws GirthError `NO_INTERSECTION` (field `stations`) when the generator
 *   misses the host (a solved joint never has one).
 * @example weldStationFrame(g.cutBundle, g.cutHost, Math.PI).dihedralDeg // A at the toe of a lateral
 */
export function weldStationFrame(bundle: GeneratorBundle, host: HostSurface, phiRad: number): WeldStationFrame {
  const hit = hitGenerator(bundle, host, phiRad);
  if (hit === undefined) {
    throw new GirthError('NO_INTERSECTION', 'stations', `stations: the generator at ${(phiRad * DEG).toFixed(3)}° misses the surface it is cut to`, phiRad);
  }
  const pipeNormal = pipeRadialDirection(bundle, phiRad);
  const hostNormal = surfaceNormal(host, hit.point);
  return {
    point: hit.point,
    pipeNormal,
    hostNormal,
    pipeBodyDirection: scale(bundle.axisDirection, -1),
    dihedralDeg: dihedralDegFromNormals(pipeNormal, hostNormal),
  };
}
