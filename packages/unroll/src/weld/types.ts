/**
 * Weld preparation of a joint, station by station: local dihedral angle,
 * bevel (torch angle) and, for a branch, how to hold the torch for the header
 * hole. Angles in degrees, lengths in mm.
 *
 * Conventions (the same on every joint):
 * - Stations are the layout's: station n (1-based) at phi = 360 (n − 1) / N,
 *   station 1 at the heel (a miter piece's throat), phi toward +y (DESIGN.md).
 * - `dihedralDeg` is the local dihedral angle at the station's point of the
 *   cut line: the angle between the tangents to the outside surfaces of the
 *   two members, measured in the plane square to the weld line (AWS D1.1's
 *   definition for tubular connections, recalled). 90 at the crown of a tee,
 *   A at the toe and 180 − A at the heel of a lateral at A. For a miter it is
 *   the angle between the two pieces' outsides, 180 less twice the cut angle
 *   at the throat and 180 plus twice it on the back.
 * - `torchDeg` is measured from the cut pipe's radial direction (square to
 *   its surface, the way a template line is cut), in the plane square to the
 *   cut line, positive leaning the torch back along the pipe body; see
 *   `bevelAtStation` for the rule. Only the cut pipe is beveled (the header or
 *   plane is left as it is); a miter's groove is split equally between its
 *   two pieces.
 */
import type { BranchFit, BevelStatus, ResolvedGroove, WeldEndBevel } from '@girth/geometry';
import type { GirthWarning } from '@girth/pipes';
import type { Polyline2 } from '../types.js';

/** Options of the weld-preparation functions. */
export interface WeldPrepOptions {
  /** Stations around the cut pipe, a whole number from 4 to 360; default 16 (the layout's). */
  readonly stations?: number;
  /** Chord tolerance of a drawn outline (the hole on the header ID), mm; default 0.05, at least 0.001. */
  readonly chordToleranceMm?: number;
}

/** The weld preparation at one station of a cut. */
export interface StationWeldPrep {
  /** 1-based station number, as on the layout. */
  readonly n: number;
  /** Station angle phi, degrees from the heel. */
  readonly angleDeg: number;
  /** Local dihedral angle, degrees (see the conventions above). */
  readonly dihedralDeg: number;
  /** The groove a radial (unbeveled) cut would leave, degrees; negative where the wall would overhang. For a miter, both pieces together. */
  readonly openingDeg: number;
  /** `bevel`, `open` (no bevel needed) or `closed` (bevel the other member too). */
  readonly bevel: BevelStatus;
  /** Torch angle from the radial, degrees in [0, 90); 0 when `open`, absent when `closed`. */
  readonly torchDeg?: number;
  /** How far back from the cut line the bevel reaches on the outside, mm; 0 when `open`, absent when `closed`. */
  readonly bevelWidthMm?: number;
}

/** How the header hole is cut at one station: torch parallel to the branch axis. */
export interface HoleStationPrep {
  readonly n: number;
  readonly angleDeg: number;
  /** Torch tilt from the header's radial at the hole edge on the OD, degrees in [0, 90]. */
  readonly torchTiltDeg: number;
  /** The tilt's part along the header, degrees, signed, + with the torch's upper end toward +x (the toe end of a lateral). */
  readonly leanAlongHeaderDeg: number;
  /** The tilt's part around the header, degrees, signed, + with the torch's upper end toward +y (the way girth grows). */
  readonly leanAroundHeaderDeg: number;
  /** Girth of the hole edge on the header ID from the top line, measured on the ID, mm (absent where the hole surface misses the bore). */
  readonly idGirthMm?: number;
  /** Axial position of the hole edge on the header ID, mm, from where the branch axis crosses the header axis. */
  readonly idAxialMm?: number;
}

/** Weld preparation of a branch joint. */
export interface BranchWeldPrep {
  readonly kind: 'branch-weld-prep';
  readonly groove: ResolvedGroove;
  readonly fit: BranchFit;
  /** The branch cut, station by station. */
  readonly stations: readonly StationWeldPrep[];
  /** The header hole, station by station (same angles). */
  readonly hole: readonly HoleStationPrep[];
  /**
   * The hole's outline on the header ID (closed; x = girth on the ID from the
   * top line, y = axial, mm), where the hole surface, cut parallel to the
   * branch axis, comes out in the bore. Absent when that surface is wider
   * than the bore.
   */
  readonly holeOnId?: Polyline2;
  readonly warnings: readonly GirthWarning[];
}

/** Weld preparation of a pipe end cut to meet a plane (a cut-back). */
export interface PlaneCutWeldPrep {
  readonly kind: 'plane-cut-weld-prep';
  readonly groove: ResolvedGroove;
  readonly stations: readonly StationWeldPrep[];
  readonly warnings: readonly GirthWarning[];
}

/** Weld preparation of a miter elbow: every weld is prepared alike, each piece end at a station as listed. */
export interface MiterWeldPrep {
  readonly kind: 'miter-weld-prep';
  /** The groove between two pieces (included angle, half on each). */
  readonly groove: ResolvedGroove;
  readonly stations: readonly StationWeldPrep[];
  /** ASME B16.25 preparation of the elbow's two square ends (recalled). */
  readonly squareEnds: WeldEndBevel;
  readonly warnings: readonly GirthWarning[];
}

/** The weld preparation of any joint, told apart by `kind`. */
export type WeldPrep = BranchWeldPrep | PlaneCutWeldPrep | MiterWeldPrep;
