/**
 * Plain readonly data of a trunnion joint: a branch or trunnion pipe set on
 * an elbow. Lengths in mm, angles in degrees where a name says `Deg`.
 */
import type { GirthWarning } from '@girth/pipes';
import type { PipeSection, ResolvedPipeSection } from '../pipe-section.js';
import type { BranchContact, BranchFit } from '../branch/types.js';
import type { TorusSurface } from '../surfaces/torus.js';
import type { GeneratorBundle } from '../types.js';
import type { Vec3 } from '../vec3.js';

/** An elbow's centreline radius: `long` 1.5 × NPS, `short` 1.0 × NPS (ASME B16.9, recalled), or a radius in mm. */
export type ElbowRadius = 'long' | 'short' | number;

/** An elbow as given. */
export interface ElbowSpec {
  /** The elbow's pipe: OD and wall, mm; `npsIn` is needed for a `long` or `short` radius. */
  readonly pipe: PipeSection;
  /** Centreline radius: `long` (default), `short`, or mm. */
  readonly radius?: ElbowRadius;
  /** Bend angle, degrees, above 0 and at most 180 (BEND_DEG); 90 when left out. */
  readonly bendDeg?: number;
}

/** An elbow checked. */
export interface ResolvedElbowSpec {
  readonly kind: 'elbow-spec';
  readonly pipe: ResolvedPipeSection;
  /** How the radius was given: `long`, `short` or `custom`. */
  readonly radiusKind: 'long' | 'short' | 'custom';
  /** Centreline radius, mm. */
  readonly bendRadiusMm: number;
  readonly bendDeg: number;
  /** Label on templates, e.g. `NPS 8 STD 90° long radius elbow`. */
  readonly label: string;
}

/** Which way a trunnion's axis runs: square to the elbow's surface at its point (`normal`), or parallel to the inlet or outlet end's pipe axis. */
export type TrunnionDirection = 'normal' | 'inlet' | 'outlet';

/** A trunnion or branch on an elbow as given. */
export interface TrunnionSpec {
  readonly elbow: ElbowSpec;
  /** The trunnion (branch) pipe. */
  readonly branch: PipeSection;
  /** Where the axis meets the elbow's outside: angle along the bend from the inlet end, degrees, 0 to the bend; half the bend when left out. */
  readonly alongDeg?: number;
  /** Where the axis meets the elbow's outside: angle around the elbow's cross-section from the extrados, degrees, −180 to 180 (180 is the intrados; positive toward the bend axis's side); 0 when left out. */
  readonly aroundDeg?: number;
  /** `normal` (default), `inlet` or `outlet`. */
  readonly direction?: TrunnionDirection;
  /** `set-on` (branch ID on elbow OD, default) or `set-in` (branch OD on elbow ID). */
  readonly fit?: BranchFit;
  /** Root gap square to the elbow, mm, ≥ 0; 0 when left out. */
  readonly gapMm?: number;
}

/** A trunnion spec checked, with every default filled in. */
export interface ResolvedTrunnionSpec {
  readonly kind: 'trunnion-spec';
  readonly elbow: ResolvedElbowSpec;
  readonly branch: ResolvedPipeSection;
  readonly alongDeg: number;
  readonly aroundDeg: number;
  readonly direction: TrunnionDirection;
  readonly fit: BranchFit;
  readonly contact: BranchContact;
  readonly gapMm: number;
}

/**
 * A trunnion on an elbow in 3D. The elbow's frame: bend centre at the
 * origin, bend axis +z, the inlet end's cross-section in the x-z plane on
 * +x (bend angle 0), the bend turning toward +y. Station 1 (HEEL) is the
 * trunnion's side toward the inlet end; stations run as a branch's (axis
 * toward the elbow × heel).
 */
export interface TrunnionGeometry {
  readonly kind: 'trunnion-geometry';
  readonly spec: ResolvedTrunnionSpec;
  readonly elbowInside: TorusSurface;
  readonly elbowOutside: TorusSurface;
  /** Where the trunnion axis meets the elbow's outside, mm. */
  readonly axisPointMm: Vec3;
  /** Unit vector along the trunnion axis, away from the elbow. */
  readonly branchAxisDirection: Vec3;
  /** Angle between the trunnion axis and the elbow's normal at its point, degrees. */
  readonly tiltFromNormalDeg: number;
  readonly cutRadiusMm: number;
  readonly cutBundle: GeneratorBundle;
  readonly cutHost: TorusSurface;
  readonly holeBundle: GeneratorBundle;
  readonly holeHost: TorusSurface;
  readonly warnings: readonly GirthWarning[];
}
