/**
 * Plain readonly data of a nozzle joint: a nozzle pipe set on or into a
 * dished vessel head. Lengths in mm, angles in degrees where a name says
 * `Deg`, else radians.
 */
import type { GirthWarning } from '@girth/pipes';
import type { PipeSection, ResolvedPipeSection } from '../pipe-section.js';
import type { BranchContact, BranchFit } from '../branch/types.js';
import type { HeadSurface } from '../surfaces/heads.js';
import type { GeneratorBundle } from '../types.js';
import type { Vec3 } from '../vec3.js';

/**
 * The shape of a dished head: `ellipsoidal` (2:1 unless `ratio` says),
 * `hemispherical`, `flanged-and-dished` (torispherical, inside crown radius =
 * OD and inside knuckle radius = 6 % of the OD: the least ASME Section VIII
 * Div. 1 UG-32(e) allows, recalled), `80-10` (torispherical, inside crown
 * radius 80 % and knuckle radius 10 % of the OD, common practice, recalled)
 * or `torispherical` with the radii given.
 */
export type HeadType = 'ellipsoidal' | 'hemispherical' | 'flanged-and-dished' | '80-10' | 'torispherical';

/** A dished head as given. Lengths in mm. */
export interface HeadSpec {
  readonly type: HeadType;
  /** Outside diameter of the head's straight flange (the vessel's OD), mm. */
  readonly odMm: number;
  /** Wall (nominal thickness), mm; the head's outside is its inside moved out by it. */
  readonly wallMm: number;
  /** How the head is named on templates, e.g. `2:1 head 48 in OD`. */
  readonly label?: string;
  /** `ellipsoidal` only: inside diameter to twice the inside depth, 1 to 4 (HEAD_RATIO); 2 when left out. */
  readonly ratio?: number;
  /** `torispherical` only: inside crown radius, mm, at least half the ID. */
  readonly crownRadiusMm?: number;
  /** `torispherical` only: inside knuckle radius, mm, above 0 and below half the ID. */
  readonly knuckleRadiusMm?: number;
  /** Straight flange below the tangent line, mm, ≥ 0; 0 when left out. Only reported: the shell goes on at the same size. */
  readonly straightFlangeMm?: number;
}

/** A head checked, with its inside profile worked out. Lengths in mm. */
export interface ResolvedHeadSpec {
  readonly kind: 'head-spec';
  readonly type: HeadType;
  readonly odMm: number;
  readonly wallMm: number;
  readonly idMm: number;
  readonly label: string;
  /** Inside depth, tangent line to crown, mm. */
  readonly insideDepthMm: number;
  /** Ellipsoidal: the ratio used. */
  readonly ratio?: number;
  /** Torispherical kinds: inside crown and knuckle radii, mm. */
  readonly crownRadiusMm?: number;
  readonly knuckleRadiusMm?: number;
  readonly straightFlangeMm: number;
}

/**
 * Which way the nozzle's axis runs: `hillside` parallel to the vessel axis,
 * `radial` along the head's normal where the axis meets the head's outside,
 * `angle` tilted from the vessel axis by `tiltDeg` (positive leaning outboard).
 */
export type NozzleDirection = 'hillside' | 'radial' | 'angle';

/** A nozzle joint as given. */
export interface NozzleSpec {
  readonly head: HeadSpec;
  readonly nozzle: PipeSection;
  /**
   * Distance of the nozzle from the head's centre line, mm, ≥ 0: for a
   * hillside nozzle, of its axis; otherwise of the point where its axis meets
   * the head's outside. 0 when left out (a nozzle in the crown centre).
   */
  readonly offsetMm?: number;
  /** `hillside` when left out. */
  readonly direction?: NozzleDirection;
  /** `angle` only: tilt of the nozzle axis from the vessel axis, degrees, −80 to 80 (NOZZLE_TILT_DEG), positive leaning outboard. */
  readonly tiltDeg?: number;
  /** `set-on` (nozzle ID on head OD) or `set-in` (nozzle OD on head ID); `set-on` when left out. */
  readonly fit?: BranchFit;
  /** Root gap square to the head, mm, ≥ 0; 0 when left out. */
  readonly gapMm?: number;
}

/** A nozzle joint checked, with every default filled in. */
export interface ResolvedNozzleSpec {
  readonly kind: 'nozzle-spec';
  readonly head: ResolvedHeadSpec;
  readonly nozzle: ResolvedPipeSection;
  readonly offsetMm: number;
  readonly direction: NozzleDirection;
  /** Tilt of the nozzle axis from the vessel axis, degrees, positive outboard (for `hillside` 0, for `radial` the head's slope there). */
  readonly tiltDeg: number;
  readonly fit: BranchFit;
  readonly contact: BranchContact;
  readonly gapMm: number;
}

/**
 * A nozzle joint in 3D. The head's frame: vessel axis along +z out through
 * the crown, the tangent line's centre at the origin, the nozzle in the x-z
 * plane on the +x side. The nozzle's heel (station 1) is its outboard side,
 * away from the head's centre line (the obtuse side and long point of a
 * hillside nozzle); stations run toward −y, the same turn about the nozzle
 * axis as a branch's (axis toward the host × heel).
 */
export interface NozzleGeometry {
  readonly kind: 'nozzle-geometry';
  readonly spec: ResolvedNozzleSpec;
  /** The head's inside surface (its profile). */
  readonly headInside: HeadSurface;
  /** The head's outside surface (the inside moved out by the wall): where the hole is marked. */
  readonly headOutside: HeadSurface;
  /** Where the nozzle axis meets the head's outside, mm. */
  readonly axisPointMm: Vec3;
  /** Unit vector along the nozzle axis, away from the head. */
  readonly nozzleAxisDirection: Vec3;
  /** Radius of the nozzle surface that meets the head (and outlines the hole), mm. */
  readonly cutRadiusMm: number;
  readonly cutBundle: GeneratorBundle;
  /** The head surface the cut meets, moved out by the root gap. */
  readonly cutHost: HeadSurface;
  readonly holeBundle: GeneratorBundle;
  /** The head's outside, on which the hole is marked. */
  readonly holeHost: HeadSurface;
  readonly warnings: readonly GirthWarning[];
}
