/**
 * The flat side of Girth: templates as plain readonly data in millimetres,
 * ready for any exporter (SVG, DXF, tables, JSON).
 *
 * Template coordinates are y-up (like DXF): x to the right, y up, in mm.
 * For a wrap template x is the girth (arc length around the OD the template
 * wraps on, 0 at station 1) and y is the distance along the pipe from the
 * square line toward the pipe body (cutback). For a hole template x is the
 * girth around the header from its top line and y the axial position along
 * the header. For a flat pattern both are plate coordinates.
 */
import type { GirthWarning } from '@girth/pipes';
import type { BranchLayout } from './branch/types.js';
import type { TemplateFacts } from './facts.js';
import type { ConeLayout } from './cone/types.js';
import type { MiterLayout } from './miter/types.js';
import type { PlaneCutLayout } from './plane-cut/types.js';
import type { WeldPrep } from './weld/types.js';
import type { JointFitUp } from './fit-up/with-fit-up.js';
import type { OrdinateReference } from './fit-up/ordinate-reference.js';
import type { TemplateOrdinates } from './fit-up/template-ordinates.js';
import type { NozzleLayout } from './nozzle/types.js';
import type { TrunnionLayout } from './trunnion/types.js';
import type { PadLayout } from './pad/types.js';
import type { ShellPlateLayout } from './shell-plate/types.js';

/** A point on the flat, `[x, y]` in mm. */
export type Point2 = readonly [number, number];

/** A polyline on the flat; `closed` joins the last point to the first. */
export interface Polyline2 {
  readonly points: readonly Point2[];
  readonly closed: boolean;
}

/** A circular arc on the flat (cone patterns draw true arcs). Angles in degrees, counter-clockwise from +x. */
export interface Arc2 {
  readonly kind: 'arc';
  readonly center: Point2;
  readonly radiusMm: number;
  readonly startDeg: number;
  readonly endDeg: number;
}

/** A straight segment on the flat. */
export interface Segment2 {
  readonly kind: 'segment';
  readonly from: Point2;
  readonly to: Point2;
}

/** A piece of a drawn path: a polyline run, an arc or a segment. */
export type PathPart = ({ readonly kind: 'polyline' } & Polyline2) | Arc2 | Segment2;

/** One station line drawn on the template, with its number. */
export interface StationLine {
  /** 1-based station number. */
  readonly n: number;
  readonly angleDeg: number;
  readonly from: Point2;
  readonly to: Point2;
}

/** Text placed on the template by the layout itself (e.g. HEEL, TOE, TOP). */
export interface TemplateLabel {
  readonly text: string;
  readonly at: Point2;
  /** Suggested cap height in mm; exporters may scale. */
  readonly heightMm: number;
}

/** What the template is for: wrapped around a pipe, marked on a header, or cut from flat plate. */
export type TemplateKind = 'wrap' | 'hole' | 'flat';

/**
 * What a station column measures, so exporters convert it on purpose:
 * `length` in mm (converted to the job's unit), `angle` in degrees (never
 * converted), `count` a plain number (never converted).
 */
export type StationQuantity = 'length' | 'angle' | 'count';

/** A column of the station table: the key in `StationRow.values` and in the JSON contract. */
export interface StationColumn {
  /** Contract key, e.g. `girth`, `cutback`, `axial`. Never rename once published. */
  readonly key: string;
  /** Heading a fitter reads, e.g. `Cutback`. */
  readonly heading: string;
  /** What the values measure: lengths in mm, angles in degrees or counts. */
  readonly quantity: StationQuantity;
  /**
   * For `angle` columns: the fixed digits a table writes (e.g. 1 for the weld
   * preparation's dihedral and torch angles, to 0.1°); absent: up to 3,
   * trailing zeros dropped. The JSON keeps the full value either way.
   */
  readonly decimals?: number;
}

/**
 * One row of the station table, keyed as the template's `stationColumns`:
 * lengths in mm, angles in degrees, counts as plain numbers (see
 * `StationColumn.quantity`). A row leaves a key out where it has no value in
 * that column (exporters print an empty cell and the JSON omits the key); a
 * key that is present always holds a finite number.
 */
export interface StationRow {
  readonly n: number;
  readonly angleDeg: number;
  readonly values: Readonly<Record<string, number>>;
}

/**
 * How a template was made into one closed part for a cutting table (see
 * `closeTemplate`): `stubMm` is the length of a single-cut wrap's stub, from
 * the square line (through the long point) to the square end, mm; absent for
 * a piece cut at both ends, a hole or a flat pattern, which close on their own.
 */
export interface ClosedPart {
  readonly stubMm?: number;
}

/** Which surface of the pipe a template is developed on (see `onDevelopmentSurface`). */
export type DevelopmentSurfaceKind = 'od' | 'mid';

/**
 * The surface a template's girth is measured on: `od` (wrapped on the outside
 * of the pipe) or `mid`, the mid-thickness (neutral) surface of a plate of
 * `plateThicknessMm` rolled into the pipe, diameter OD - t, or rolled onto
 * its outside (a reinforcing pad), diameter OD + t. The cut keeps its
 * true place on the pipe; only the girth is measured on another diameter.
 */
export interface Development {
  readonly surface: DevelopmentSurfaceKind;
  /** Diameter the girth is measured on, mm: the OD, OD - t, or OD + t for a plate on the outside. */
  readonly diameterMm: number;
  /** The OD of the pipe the template is for, mm. */
  readonly odMm: number;
  /** Plate thickness, mm; present for `mid`. */
  readonly plateThicknessMm?: number;
}

/** What every template has, whatever its kind. */
export interface TemplateBase {
  /** Contract id: `branch-cut`, `header-hole`, `miter-end`, `miter-middle`, `plane-cut`, `cone-pattern`, ... */
  readonly id: string;
  readonly kind: TemplateKind;
  /** One line saying what this is, e.g. `Branch cut: NPS 6 STD on NPS 12 STD, 45°, set-on`. */
  readonly title: string;
  /** Further lines for the title block (pipe sizes, fit, which edge to the heel). */
  readonly notes: readonly string[];
  /** The typed facts `title` and `notes` are worded from (see `describeResult`); absent on hand-made templates. */
  readonly facts?: TemplateFacts;
  /** The line(s) to cut on. Closed for holes and flat patterns. */
  readonly cut: readonly PathPart[];
  /** Station lines with their numbers. */
  readonly stationLines: readonly StationLine[];
  /** Other layout marks: centre lines, top line, seam. */
  readonly marks: readonly PathPart[];
  readonly labels: readonly TemplateLabel[];
  readonly stationColumns: readonly StationColumn[];
  readonly stations: readonly StationRow[];
  /** The ordinates of its cut(s), from the chosen square line, worded for the job; set by `withFitUp` on templates with a cut measured from a square line. */
  readonly ordinates?: TemplateOrdinates;
  /** The joint's fit-up dimensions in the job's unit, one sentence a line; set by `withFitUp`. */
  readonly fitUpLines?: readonly string[];
  /** Set when the template was made into one closed part to cut (see {@link ClosedPart}). */
  readonly closedPart?: ClosedPart;
  /** Set when the template was developed on a chosen surface (see {@link Development}); absent means the OD. */
  readonly development?: Development;
}

/** A template wrapped around a pipe's OD: x is the girth from station 1, y runs along the pipe. */
export interface WrapTemplate extends TemplateBase {
  readonly kind: 'wrap';
  /** The developed length of the girth, pi x the OD wrapped, mm. */
  readonly stretchOutMm: number;
  /** The OD the template wraps on, mm. */
  readonly wrapOdMm: number;
  /** The square line: a reference square to the pipe axis. */
  readonly squareLine: Segment2;
  /**
   * The line on the pipe that station 1 (edge x = 0) goes on, in the fitter's
   * words, lower case: `heel` for branch and plane cuts, `throat` for miters.
   */
  readonly startLine: string;
  /**
   * Rows of words written beside the wrap, one cell per station, off the
   * template (never across the cut line): the weld preparation's torch and
   * dihedral angles. Absent when none were asked for.
   */
  readonly bands?: readonly StationBand[];
}

/**
 * A row of words written beside a wrap at its stations (the bevel band): a
 * heading and one short cell per station, already worded. A station left out
 * gets no cell.
 */
export interface StationBand {
  /** Contract key, e.g. `torch`, `dihedral`. */
  readonly key: string;
  /** Words a fitter reads at the start of the row, e.g. `Torch angle (deg)`. */
  readonly heading: string;
  readonly cells: readonly { readonly n: number; readonly text: string }[];
}

/** A template laid on a header's OD to mark the hole: x is the girth from the top line, y the axial position. */
export interface HoleTemplate extends TemplateBase {
  readonly kind: 'hole';
  /** The OD of the pipe the hole is marked on, mm. */
  readonly wrapOdMm: number;
  /** How the template is used when it is not laid on a pipe's OD (a hole in a dished head), one sentence in the fitter's words. */
  readonly placement?: string;
}

/** A flat pattern cut from plate (cones): plate coordinates. */
export interface FlatTemplate extends TemplateBase {
  readonly kind: 'flat';
}

/**
 * A developed template: everything an exporter draws, and the station table;
 * tagged by `kind` so each exporter handles each kind on purpose.
 */
export type Template = WrapTemplate | HoleTemplate | FlatTemplate;

/** A pipe as a joint actually used it, for the result and the title block. */
export interface PipeUsed {
  /** `header`, `branch`, `pipe`, ... */
  readonly role: string;
  readonly label: string;
  readonly odMm: number;
  readonly wallMm: number;
  readonly idMm: number;
}

/**
 * The fields every joint's layout returns: the templates, the pipes used and
 * warnings. Each joint's result extends it with its own fields (a miter's
 * `pieces`, a cone's `pattern`, ...); {@link LayoutResult} is their union.
 */
export interface LayoutResultBase {
  /** Contract kind of the joint, e.g. `branch`. */
  readonly kind: string;
  readonly templates: readonly Template[];
  readonly pipes: readonly PipeUsed[];
  readonly warnings: readonly GirthWarning[];
  /** The weld preparation, when asked for (see `withBranchWeldPrep` and its siblings); absent otherwise. */
  readonly weldPrep?: WeldPrep;
  /** The joint's fit-up dimensions (mm, degrees); set by `withFitUp`. */
  readonly fitUp?: JointFitUp;
  /** The square line the station tables are measured from; set by `withFitUp` (absent: the long point). */
  readonly ordinatesFrom?: OrdinateReference;
}

/**
 * What a joint's layout returns, told apart by `kind` (contract values, never
 * renamed): `branch`, `miter`, `plane-cut` (a pipe end cut to a plane) or
 * `reducer` (a cone, concentric or eccentric by its `form`), `nozzle` (a
 * nozzle in a dished head), `trunnion` (a branch or trunnion on an elbow), `pad`
 * (a reinforcing pad under a branch), `shell-plate` (a shell rolled from plate
 * with its branch holes).
 */
export type LayoutResult = BranchLayout | MiterLayout | PlaneCutLayout | ConeLayout | NozzleLayout | TrunnionLayout | PadLayout | ShellPlateLayout;

/** The contract kinds of {@link LayoutResult}. */
export type LayoutKind = LayoutResult['kind'];
