/**
 * Plain readonly data of a branch joint: a branch pipe meeting a header
 * (tee at 90°, lateral at other angles), centred or offset, set-on or set-in.
 * Lengths in mm, angles in degrees where a name says `Deg`, else radians.
 */
import type { GirthWarning } from '@girth/pipes';
import type { PipeSection, ResolvedPipeSection } from '../pipe-section.js';
import type { GeneratorBundle, HostSurface } from '../types.js';
import type { Vec3 } from '../vec3.js';

/** How the branch sits on the header: set on its outside, or set into the hole down to the bore. */
export type BranchFit = 'set-on' | 'set-in';

/** Which face of a pipe wall: its inside (the ID) or its outside (the OD). */
export type PipeFace = 'inside' | 'outside';

/** Which branch surface meets which header surface at the cut. */
export interface BranchContact {
  readonly branch: PipeFace;
  readonly header: PipeFace;
}

/** A branch joint as given. */
export interface BranchSpec {
  readonly header: PipeSection;
  readonly branch: PipeSection;
  /** Angle between the branch and header axes, degrees, from 1 (MIN_JOINT_ANGLE_DEG) to 90; 90 (a tee) when left out. */
  readonly angleDeg?: number;
  /** Sideways offset of the branch axis from the header axis, mm, signed, along +y; 0 when left out. */
  readonly offsetMm?: number;
  /** `set-on` (branch ID on header OD) or `set-in` (branch OD on header ID); `set-on` when left out. */
  readonly fit?: BranchFit;
  /**
   * Overrides which surfaces meet, whatever the fit says: e.g.
   * `{ branch: 'outside', header: 'outside' }` cuts the branch OD to the
   * header OD. The hole is still the contacting branch surface on the header OD.
   */
  readonly contact?: BranchContact;
  /** Root gap left between branch end and header, square to the header surface, mm, ≥ 0; 0 when left out. */
  readonly gapMm?: number;
}

/** A checked pipe of a branch joint (see `resolvePipeSection`) and which of the two it is. Lengths in mm. */
export interface BranchPipeSection extends ResolvedPipeSection {
  readonly role: 'header' | 'branch';
}

/** A branch joint checked and with every default filled in. */
export interface ResolvedBranchSpec {
  readonly kind: 'branch-spec';
  readonly header: BranchPipeSection;
  readonly branch: BranchPipeSection;
  readonly angleDeg: number;
  readonly offsetMm: number;
  readonly fit: BranchFit;
  /** The surfaces that meet: from the fit, or the given override. */
  readonly contact: BranchContact;
  readonly gapMm: number;
}

/**
 * The 3D set-up of a branch joint (DESIGN.md conventions): header axis along
 * x; branch axis b = (cos A, 0, sin A) in the x-z plane coming from +z,
 * offset e along +y; heel direction u = (−sin A, 0, cos A), side +y.
 */
export interface BranchGeometry {
  readonly kind: 'branch-geometry';
  readonly spec: ResolvedBranchSpec;
  /** Angle between the axes, radians, in (0, π/2]. */
  readonly angleRad: number;
  /** Unit vector along the branch axis away from the header. */
  readonly branchAxisDirection: Vec3;
  /** Radius of the branch surface that meets the header (and outlines the hole), mm. */
  readonly cutRadiusMm: number;
  /** The branch end as generator lines of its contacting surface. */
  readonly cutBundle: GeneratorBundle;
  /** The header surface the cut meets, moved out by the root gap. */
  readonly cutHost: HostSurface;
  /** Station angles where a cut generator grazes `cutHost` (kinks), radians in [0, 2π); empty unless the branch side is flush with the header side. */
  readonly cutKinkPhisRad: readonly number[];
  /** The hole's outline as generator lines (same surface as the cut). */
  readonly holeBundle: GeneratorBundle;
  /** The header OD, on which the hole is marked; its `zeroGirthDirection` (+z) is the top line its development starts from. */
  readonly holeHost: HostSurface;
  /** Station angles where a hole generator grazes the header OD, radians in [0, 2π). */
  readonly holeKinkPhisRad: readonly number[];
  readonly warnings: readonly GirthWarning[];
}
