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

/** A column of the station table: the key in `StationRow.lengthsMm` and in the JSON contract. */
export interface StationColumn {
  /** Contract key, e.g. `girth`, `cutback`, `axial`. Never rename once published. */
  readonly key: string;
  /** Heading a fitter reads, e.g. `Cutback`. */
  readonly heading: string;
}

/**
 * One row of the station table. Lengths in mm, keyed as the template's
 * `stationColumns`. A row leaves a key out where it has no value in that column
 * (exporters print an empty cell and the JSON omits the key); a key that is
 * present always holds a finite number.
 */
export interface StationRow {
  readonly n: number;
  readonly angleDeg: number;
  readonly lengthsMm: Readonly<Record<string, number>>;
}

/**
 * A developed template: everything an exporter draws, and the station table.
 */
export interface Template {
  /** Contract id: `branch-cut`, `header-hole`, `miter-end`, `miter-middle`, `plane-cut`, `cone-pattern`, ... */
  readonly id: string;
  readonly kind: TemplateKind;
  /** One line saying what this is, e.g. `Branch cut: NPS 6 STD on NPS 12 STD, 45°, set-on`. */
  readonly title: string;
  /** Further lines for the title block (pipe sizes, fit, which edge to the heel). */
  readonly notes: readonly string[];
  /** The typed facts `title` and `notes` are worded from (see `describeResult`); absent on hand-made templates. */
  readonly facts?: TemplateFacts;
  /** For wraps: the developed length of the girth, pi x the OD wrapped, mm. */
  readonly stretchOutMm?: number;
  /** For wraps: the OD the template wraps on, mm. */
  readonly wrapOdMm?: number;
  /** The line(s) to cut on. Closed for holes and flat patterns. */
  readonly cut: readonly PathPart[];
  /** The square line (wraps): a reference square to the pipe axis. */
  readonly squareLine?: Segment2;
  /** Station lines with their numbers. */
  readonly stationLines: readonly StationLine[];
  /** Other layout marks: centre lines, top line, seam. */
  readonly marks: readonly PathPart[];
  readonly labels: readonly TemplateLabel[];
  readonly stationColumns: readonly StationColumn[];
  readonly stations: readonly StationRow[];
}

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
}

/**
 * What a joint's layout returns, told apart by `kind` (contract values, never
 * renamed): `branch`, `miter`, `plane-cut` (a pipe end cut to a plane) or
 * `reducer` (a cone, concentric or eccentric by its `form`).
 */
export type LayoutResult = BranchLayout | MiterLayout | PlaneCutLayout | ConeLayout;

/** The contract kinds of {@link LayoutResult}. */
export type LayoutKind = LayoutResult['kind'];
