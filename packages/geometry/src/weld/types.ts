/**
 * Plain readonly data of weld preparation: the groove asked for, and what a
 * station of a cut needs. Lengths in mm, angles in degrees where a name says
 * `Deg`.
 */
import type { Vec3 } from '../vec3.js';

/**
 * A groove weld as asked for.
 *
 * - `grooveAngleDeg`: the included angle of the groove, degrees, in (0, 90).
 *   For a branch or a cut-back it is the angle between the bevel face of the
 *   cut pipe and the surface it meets (the host is not beveled). For a miter
 *   it is the included angle between the two pieces' bevel faces, half on
 *   each piece (a single-V groove).
 * - `landMm`: root face left square at the root, mm, ≥ 0 and less than the
 *   wall of the pipe that is beveled; 0 when left out.
 */
export interface GrooveSpec {
  readonly grooveAngleDeg: number;
  readonly landMm?: number;
}

/** A groove checked against the wall it is cut in. */
export interface ResolvedGroove {
  readonly kind: 'groove';
  readonly grooveAngleDeg: number;
  readonly landMm: number;
  /** Wall of the beveled pipe, mm. */
  readonly wallMm: number;
}

/**
 * What a bevel does at a station:
 * - `bevel`: cut the wall at `torchDeg` from the radial direction;
 * - `open`: the joint already opens at least the groove angle with the wall
 *   cut radially (square to the pipe surface): no bevel needed;
 * - `closed`: the members meet at less than the groove angle, so no bevel on
 *   the cut pipe alone opens the groove (the torch would lie along the wall);
 *   the host must be prepared too, or another detail used.
 */
export type BevelStatus = 'bevel' | 'open' | 'closed';

/**
 * The bevel at one station, from the local dihedral angle and the groove.
 * Angles in degrees, lengths in mm.
 */
export interface StationBevel {
  readonly status: BevelStatus;
  /**
   * Torch angle from the cut pipe's radial direction (square to its
   * surface), measured in the plane square to the cut line, positive leaning
   * back along the pipe body (away from the joint); 0 for `open`; absent for
   * `closed`. In [0, 90).
   */
  readonly torchDeg?: number;
  /**
   * How far back from the cut line, along the pipe's outside surface and
   * square to the line, the bevel reaches: (wall − land) · tan(torchDeg), mm;
   * 0 for `open`; absent for `closed`.
   */
  readonly bevelWidthMm?: number;
  /** The groove the wall cut radially would leave, degrees (negative where the wall would overhang the host). */
  readonly openingDeg: number;
}

/**
 * The local frame of a cut at one station: where the station's generator
 * meets its host, and the outward normals of both members there.
 */
export interface WeldStationFrame {
  /** The station's point on the cut line, mm. */
  readonly point: Vec3;
  /** Unit outward normal of the cut pipe (its radial direction at the station). */
  readonly pipeNormal: Vec3;
  /** Unit normal of the host there, pointing toward the cut pipe's side. */
  readonly hostNormal: Vec3;
  /** Unit vector along the cut pipe's axis, away from the host (into the pipe body). */
  readonly pipeBodyDirection: Vec3;
  /**
   * Local dihedral angle between the cut pipe's outside surface and the
   * host's, degrees in [0, 180]: 180 − the angle between the two normals.
   */
  readonly dihedralDeg: number;
}
