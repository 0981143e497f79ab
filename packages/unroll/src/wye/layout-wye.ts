/**
 * Two branches on one header (a wye or a cross): each branch's cut and its
 * hole in the header's one frame, and where the holes or their welds collide.
 */
import type { BranchSpec, PipeSection } from '@girth/geometry';
import { GirthError, requireFinite, type GirthWarning } from '@girth/pipes';
import { layoutBranch } from '../branch/layout-branch.js';
import type { BranchLayout, LayoutBranchOptions } from '../branch/types.js';
import type { HoleTemplate, PathPart, Point2, Template } from '../types.js';

/** One branch of a wye: a branch joint placed along and around the header. */
export interface WyeBranch extends Omit<BranchSpec, 'header'> {
  /** Where the branch axis crosses the header axis, along the header, mm. */
  readonly stationMm: number;
  /** Turn of the branch about the header axis from the top line, degrees, positive toward increasing girth. */
  readonly clockDeg: number;
  /** `forward` (default): the toe toward increasing axial position; `back`: the branch mirrored along the header. */
  readonly facing?: 'forward' | 'back';
}

/** Two branches on one header. */
export interface WyeSpec {
  readonly header: PipeSection;
  readonly branches: readonly [WyeBranch, WyeBranch];
  /**
   * Least clear distance between the two hole edges over the header OD, mm,
   * below which the welds are warned as colliding; default the two branch
   * walls added (each weld reaches about a wall out from its hole edge,
   * common practice, recalled).
   */
  readonly weldClearanceMm?: number;
}

/** A wye laid out: each branch's layout as `layoutBranch` gives it, and the two holes in the header's frame. */
export interface WyeLayout {
  readonly kind: 'wye';
  readonly branches: readonly [BranchLayout, BranchLayout];
  /** The two `header-hole` templates moved to the header's frame: x girth from the top line, y axial, mm. */
  readonly holes: readonly [HoleTemplate, HoleTemplate];
  /** Least clear distance between the hole edges over the header OD, mm. */
  readonly clearanceMm: number;
  readonly warnings: readonly GirthWarning[];
}

/**
 * Lays out two branches on one header. Each branch is laid out alone (its
 * cut does not change for the other one), and its `header-hole` is moved into
 * the header's frame: girth + R x clock, axial + station (mirrored along the
 * header for `facing: 'back'`).
 *
 * Holes that overlap are an error, not a warning: the two branches then meet
 * each other as well as the header, and neither cut (laid out against the
 * header alone) is true. Holes closer than `weldClearanceMm` are a warning
 * (`WYE_WELDS_CLOSE`, field `branches`).
 *
 * @throws GirthError `HOLES_OVERLAP` (field `branches`) when the holes
 *   overlap; `NOT_FINITE`/`NOT_A_NUMBER` on a station or clock; every error
 *   of `layoutBranch`, fields prefixed `branches[i].`.
 * @example
 * const h = { odMm: 323.85, wallMm: 9.525 }, b = { odMm: 114.3, wallMm: 6.02 };
 * layoutWye({ header: h, branches: [{ branch: b, stationMm: 0, clockDeg: 0 }, { branch: b, stationMm: 0, clockDeg: 180 }] }).clearanceMm
 */
export function layoutWye(spec: WyeSpec, options: LayoutBranchOptions = {}): WyeLayout {
  const R = spec.header.odMm / 2;
  const laid = spec.branches.map((b, i) => {
    const stationMm = requireFinite(b.stationMm, `branches[${i}].stationMm`);
    const clockDeg = requireFinite(b.clockDeg, `branches[${i}].clockDeg`);
    const { stationMm: _s, clockDeg: _c, facing, ...rest } = b;
    let layout: BranchLayout;
    try {
      layout = layoutBranch({ ...rest, header: spec.header }, options);
    } catch (e) {
      throw e instanceof GirthError ? e.withField(`branches[${i}].${e.field}`) : e;
    }
    const sign = facing === 'back' ? -1 : 1;
    const move = (p: Point2): Point2 => [p[0] + (R * clockDeg * Math.PI) / 180, stationMm + sign * p[1]];
    return { layout, hole: moveHole(layout.templates[1] as HoleTemplate, move, i) };
  }) as [{ layout: BranchLayout; hole: HoleTemplate }, { layout: BranchLayout; hole: HoleTemplate }];

  const [a, b] = [outline(laid[0].hole), outline(laid[1].hole)];
  const circumference = 2 * Math.PI * R;
  let clearanceMm = Infinity;
  for (const shift of [-circumference, 0, circumference]) {
    const bs = b.map((p): Point2 => [p[0] + shift, p[1]]);
    if (overlaps(a, bs)) {
      throw new GirthError('HOLES_OVERLAP', 'branches', 'branches: the two holes in the header run into each other, so the branches meet each other too; space them further apart along or around the header');
    }
    clearanceMm = Math.min(clearanceMm, polylineDistance(a, bs));
  }
  const weldClearanceMm = spec.weldClearanceMm ?? laid[0].layout.pipes[1]!.wallMm + laid[1].layout.pipes[1]!.wallMm;
  const warnings: GirthWarning[] = [...laid[0].layout.warnings, ...laid[1].layout.warnings];
  if (clearanceMm < weldClearanceMm) {
    warnings.push({
      code: 'WYE_WELDS_CLOSE',
      field: 'branches',
      message: `the two holes are ${clearanceMm.toFixed(1)} mm apart over the header, less than ${weldClearanceMm.toFixed(1)} mm: the welds run into each other; check the weld procedure and reinforcement`,
    });
  }
  return { kind: 'wye', branches: [laid[0].layout, laid[1].layout], holes: [laid[0].hole, laid[1].hole], clearanceMm, warnings };
}

function moveHole(t: HoleTemplate, move: (p: Point2) => Point2, i: number): HoleTemplate {
  const part = (p: PathPart): PathPart =>
    p.kind === 'polyline' ? { ...p, points: p.points.map(move) } : p.kind === 'segment' ? { ...p, from: move(p.from), to: move(p.to) } : { ...p, center: move(p.center) };
  return {
    ...t,
    id: `header-hole-${i + 1}`,
    title: `${t.title} (branch ${i + 1} of 2)`,
    cut: t.cut.map(part),
    marks: t.marks.map(part),
    stationLines: t.stationLines.map((s) => ({ ...s, from: move(s.from), to: move(s.to) })),
    labels: t.labels.map((l) => ({ ...l, at: move(l.at) })),
    stations: t.stations.map((r) => {
      const [girth, axial] = move([r.values.girth ?? 0, r.values.axial ?? 0]);
      return { ...r, values: { ...r.values, girth, axial } };
    }),
  };
}

function outline(t: Template): readonly Point2[] {
  const c = t.cut[0];
  if (c?.kind !== 'polyline') throw new GirthError('BAD_OPTION', 'template.cut', 'template.cut: a hole outline is a polyline');
  return c.points;
}

function inside(p: Point2, poly: readonly Point2[]): boolean {
  let inn = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i]!;
    const b = poly[j]!;
    if (a[1] > p[1] !== b[1] > p[1] && p[0] < ((b[0] - a[0]) * (p[1] - a[1])) / (b[1] - a[1]) + a[0]) inn = !inn;
  }
  return inn;
}

/** True when two closed polygons share any area (a vertex of one inside the other, or crossing edges, which the dense samples reduce to vertices). */
function overlaps(a: readonly Point2[], b: readonly Point2[]): boolean {
  return a.some((p) => inside(p, b)) || b.some((p) => inside(p, a));
}

function segDistance(p: Point2, a: Point2, b: Point2): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const l2 = dx * dx + dy * dy;
  const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / l2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Least distance between two closed polylines (vertex to edge both ways). */
function polylineDistance(a: readonly Point2[], b: readonly Point2[]): number {
  let d = Infinity;
  for (const [p, q] of [[a, b], [b, a]] as const) {
    for (const v of p) for (let i = 0; i < q.length; i++) d = Math.min(d, segDistance(v, q[i]!, q[(i + 1) % q.length]!));
  }
  return d;
}
