/**
 * The frame of a branch: its axis, heel and side directions, and its
 * generator lines (DESIGN.md conventions).
 */
import type { GeneratorBundle } from '../types.js';
import type { Vec3 } from '../vec3.js';

/**
 * Unit vector along the branch axis away from the header: b = (cos A, 0, sin A).
 * @param angleRad angle between the axes, radians, in (0, π/2].
 * @example branchAxisDirection(Math.PI / 2) // [≈0, 0, 1]
 */
export function branchAxisDirection(angleRad: number): Vec3 {
  return [Math.cos(angleRad), 0, Math.sin(angleRad)];
}

/**
 * The generator lines of a branch surface of radius `radiusMm`: axis through
 * (0, e, 0) pointing toward the header (−b), heel direction
 * u = (−sin A, 0, cos A) on the obtuse side, side direction +y (so phi grows
 * toward +y; −b × u = +y).
 *
 * @param angleRad angle between the axes, radians, in (0, π/2].
 * @param offsetMm offset e of the branch axis along +y, mm.
 * @param radiusMm radius of the branch surface, mm, > 0.
 * @example branchBundle(Math.PI / 4, 0, 80).heelDirection // [−0.707, 0, 0.707]
 */
export function branchBundle(angleRad: number, offsetMm: number, radiusMm: number): GeneratorBundle {
  const b = branchAxisDirection(angleRad);
  return {
    radius: radiusMm,
    axisPoint: [0, offsetMm, 0],
    axisDirection: [-b[0], 0, -b[2]],
    heelDirection: [-Math.sin(angleRad), 0, Math.cos(angleRad)],
    sideDirection: [0, 1, 0],
  };
}
