/**
 * Bundles and hosts written out by hand for the wrap tests, so they do not
 * depend on any joint's solver. Conventions as DESIGN.md: header along x,
 * branch from +z at angle A in the x-z plane, offset e along +y.
 */
import type { CylinderSurface, GeneratorBundle, PlaneSurface } from '@girth/geometry';

/** The header: a cylinder of radius `radiusMm` along x. */
export function headerAlongX(radiusMm: number): CylinderSurface {
  return { kind: 'cylinder', radius: radiusMm, axisPoint: [0, 0, 0], axisDirection: [1, 0, 0] };
}

/** A branch of radius `radiusMm` at `angleDeg` to the header, offset `offsetMm` along +y. */
export function branchBundle(radiusMm: number, angleDeg: number, offsetMm = 0): GeneratorBundle {
  const a = (angleDeg * Math.PI) / 180;
  return {
    radius: radiusMm,
    axisPoint: [0, offsetMm, 0],
    axisDirection: [-Math.cos(a), 0, -Math.sin(a)],
    heelDirection: [-Math.sin(a), 0, Math.cos(a)],
    sideDirection: [0, 1, 0],
  };
}

/** A straight pipe along +z toward the host, heel toward +x. */
export function pipeAlongZ(radiusMm: number): GeneratorBundle {
  return { radius: radiusMm, axisPoint: [0, 0, 0], axisDirection: [0, 0, 1], heelDirection: [1, 0, 0], sideDirection: [0, 1, 0] };
}

/** A plane through the origin tilted by `cutDeg` from square to z, facing the pipe (normal toward −z). */
export function tiltedPlane(cutDeg: number): PlaneSurface {
  const c = (cutDeg * Math.PI) / 180;
  return { kind: 'plane', point: [0, 0, 0], normal: [Math.sin(c), 0, -Math.cos(c)] };
}

/**
 * Axial position (mm, toward the header) where the generator at `phi` of
 * {@link branchBundle} meets the header, in closed form from y² + z² = R²:
 * y = e + r sin phi, z = +sqrt(R² − y²), t = (r cos phi cos A − z) / sin A.
 */
export function branchAxialClosedForm(R: number, r: number, angleDeg: number, offsetMm: number, phi: number): number {
  const a = (angleDeg * Math.PI) / 180;
  const y = offsetMm + r * Math.sin(phi);
  const z = Math.sqrt(Math.max(0, R * R - y * y));
  return (r * Math.cos(phi) * Math.cos(a) - z) / Math.sin(a);
}

/**
 * The hole edge on the header OD (radius `R`) at station `phi`, developed,
 * in closed form: y = e + r sin phi, z = sqrt(R² − y²); girth = R · atan2(y, z);
 * axial x = (z cos A − r cos phi) / sin A (the generator point where it meets the cylinder).
 */
export function holeClosedForm(R: number, r: number, angleDeg: number, offsetMm: number, phi: number): readonly [number, number] {
  const a = (angleDeg * Math.PI) / 180;
  const y = offsetMm + r * Math.sin(phi);
  const z = Math.sqrt(Math.max(0, R * R - y * y));
  return [R * Math.atan2(y, z), (z * Math.cos(a) - r * Math.cos(phi)) / Math.sin(a)];
}
