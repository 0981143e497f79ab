/**
 * A shell made from plate (a header rolled from a flat sheet) with its branch
 * holes cut flat before rolling: the input and the laid-out result.
 */
import type { BranchFit, PipeSection } from '@girth/geometry';
import type { LayoutResultBase, Template } from '../types.js';

/** One branch on the shell: its pipe, how it meets the shell, and where it stands. */
export interface ShellPlateBranch {
  /** What the fitter calls it on the drawing, e.g. `N1` or `drain`; printed beside the hole. */
  readonly name: string;
  readonly branch: PipeSection;
  /** Angle between branch and shell axes, degrees, 1 to 90; 90 (a tee) when left out. A lateral leans its toe toward the far end (higher stations). */
  readonly angleDeg?: number;
  /** Sideways offset of the branch axis from the shell axis, mm, signed; positive moves it clockwise (toward higher clock positions); 0 when left out. */
  readonly offsetMm?: number;
  /** `set-on` (branch ID on shell OD, default) or `set-in` (branch OD on shell ID). */
  readonly fit?: BranchFit;
  /** Root gap square to the shell, mm, at least 0; 0 when left out. */
  readonly gapMm?: number;
  /** Axial station: distance along the shell from its start end (the plate's lower edge) to where the branch axis crosses the shell axis, mm. */
  readonly stationMm: number;
  /**
   * Clock position of the branch, hours, 0 to 12 (0 and 12 both the top):
   * read looking along the shell from its start end, 12 on top, increasing
   * clockwise. Decimals allowed (4.5 is half past four, 135°).
   */
  readonly clockHours: number;
}

/** Input of `layoutShellPlate`. Lengths in mm. */
export interface ShellPlateSpec {
  /** The shell (header) the plate rolls into: OD and wall; the wall is the plate thickness. */
  readonly header: PipeSection;
  /** Length of the shell along its axis, mm, above 0. */
  readonly lengthMm: number;
  /** Clock position of the long seam, hours, 0 to 12 (as the branches'); 3 when left out. */
  readonly seamClockHours?: number;
  /** Longest plate the shop can cut, mm; a longer shell is split into equal courses with circumferential seams. None when left out. */
  readonly maxPlateLengthMm?: number;
  /**
   * Width of the weld zone kept clear around each hole, mm, at least 0: holes
   * whose zones (each hole grown by this width) meet are warned about. Default
   * the larger of 50 mm and twice the shell wall (see {@link defaultWeldZoneMm}).
   */
  readonly weldZoneMm?: number;
  readonly branches: readonly ShellPlateBranch[];
}

/** Options of `layoutShellPlate`. */
export interface ShellPlateOptions {
  /** Points per hole, as a branch layout's stations; default 16. */
  readonly stations?: number;
  /** Largest distance between a drawn chord and the true hole edge, mm; default 0.05. */
  readonly chordToleranceMm?: number;
}

/** Where one hole went: which course, its centre on that course's plate, mm. */
export interface ShellPlateHole {
  readonly name: string;
  /** 1-based course (plate) the hole is cut in. */
  readonly course: number;
  /** Girth from the long seam to where the branch axis pierces the shell, on the mid-thickness surface, mm. */
  readonly girthMm: number;
  /** Axial position of the same point from the course's lower edge, mm. */
  readonly axialMm: number;
  readonly clockHours: number;
  readonly stationMm: number;
}

/**
 * A shell plate laid out: one `flat` template per course (`shell-plate` when
 * the shell is one plate, `shell-course-1`, `shell-course-2`, ... otherwise),
 * each its rectangle on the mid-thickness surface with its holes as inner
 * contours.
 */
export interface ShellPlateLayout extends LayoutResultBase {
  readonly kind: 'shell-plate';
  readonly templates: readonly Template[];
  /** Width of each plate: pi x (OD - t), mm. */
  readonly plateWidthMm: number;
  /** Length of each course, mm (the shell length when it is one plate). */
  readonly courseLengthMm: number;
  readonly courses: number;
  readonly lengthMm: number;
  readonly thicknessMm: number;
  readonly seamClockHours: number;
  readonly weldZoneMm: number;
  readonly holes: readonly ShellPlateHole[];
}
