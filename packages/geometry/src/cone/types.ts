/**
 * Plain data of cone frustums (reducers) in 3D. Lengths in mm, angles in
 * radians unless a name says `Deg`.
 *
 * Frame: the cone axis of the large end is the z axis. The large end lies in
 * the plane z = 0, centred on the origin; the small end lies in the plane
 * z = lengthMm, centred at (offsetMm, 0, lengthMm). The element (straight line
 * on the surface) at station angle theta joins the large-end point at angle
 * theta to the small-end point at the same angle; theta = 0 points along +x and
 * grows toward +y.
 */
import type { Vec3 } from '../vec3.js';

/**
 * A cone frustum with circular ends in parallel planes: a right (concentric)
 * cone when `offsetMm` is 0, an oblique one otherwise. With
 * `offsetMm = largeRadiusMm − smallRadiusMm` the element at theta = 0 runs
 * parallel to the axis: the flat side of an eccentric reducer.
 *
 * Every element passes through one apex (the ends are similar circles), so the
 * surface is a true cone and can be rolled from flat plate.
 */
export interface ConeFrustum {
  readonly kind: 'cone-frustum';
  /** Radius of the large end, mm (> smallRadiusMm). */
  readonly largeRadiusMm: number;
  /** Radius of the small end, mm (> 0). */
  readonly smallRadiusMm: number;
  /** Distance between the end planes, along the axis, mm (> 0). */
  readonly lengthMm: number;
  /** Sideways (+x) offset of the small end's centre from the large end's, mm. */
  readonly offsetMm: number;
}

/** Which surface of the plate the given end diameters belong to. */
export type DiameterSurface = 'outside' | 'inside' | 'mean';

/**
 * The mean (middle) surface of a cone rolled from plate, which is the surface
 * a flat pattern is developed on. It is the `given` surface (the one whose end
 * diameters were given) moved along its own normal by `normalShiftMm`:
 * −t/2 when the outside was given, +t/2 for the inside, 0 for the mean itself.
 * Each element of the mean surface is the matching element of the given
 * surface moved sideways, parallel to itself, and cut by the same end planes.
 */
export interface ConeSheet {
  readonly kind: 'cone-sheet';
  readonly given: ConeFrustum;
  readonly diametersAt: DiameterSurface;
  /** Plate thickness, mm (≥ 0). */
  readonly thicknessMm: number;
  /** Signed move from the given surface to the mean surface along the outward normal, mm. */
  readonly normalShiftMm: number;
}

/** One element of a cone surface: its end points in the large-end and small-end planes (mm). */
export interface ConeElement {
  readonly kind: 'cone-element';
  /** Station angle theta, radians. */
  readonly thetaRad: number;
  /** The point in the large-end plane (z = 0). */
  readonly large: Vec3;
  /** The point in the small-end plane (z = lengthMm). */
  readonly small: Vec3;
}

/** Concentric (right) or eccentric (one side flat) reducer. */
export type ConeForm = 'concentric' | 'eccentric';
