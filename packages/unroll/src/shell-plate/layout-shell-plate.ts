/**
 * A shell (header) rolled from plate, with its branch holes cut flat before
 * rolling: the plate's rectangle on the mid-thickness surface and every hole
 * as an inner contour at its true place.
 */
import { resolvePipeSection, solveBranch, type ResolvedPipeSection } from '@girth/geometry';
import { GirthError, isGirthError, requireFinite, requireInRange, requireNonNegative, requirePositive, type GirthWarning } from '@girth/pipes';
import { developHeaderHole } from '../branch/header-hole.js';
import { describeLength, describeLine, factLine, lengthFact, textLine, type FactLine } from '../facts.js';
import { developmentNote, onDevelopmentSurface } from '../plate/development-surface.js';
import type { Development, FlatTemplate, PathPart, PipeUsed, Point2, StationRow, TemplateLabel } from '../types.js';
import { contourGapMm } from './contour-clearance.js';
import type { ShellPlateHole, ShellPlateLayout, ShellPlateOptions, ShellPlateSpec } from './types.js';

/** Clock position of the long seam when none is given, hours (3 o'clock: off the top, where branches usually stand, and off the bottom, where water lies; common practice, recalled). */
export const DEFAULT_SEAM_CLOCK_HOURS = 3;

/** Most courses one shell is split into. */
export const MAX_SHELL_COURSES = 100;

/** Cap height of the words on a shell plate, mm. */
const LABEL_MM = 8;
/** Half the arm of a hole's centre mark, mm. */
const ARM_MM = 10;

/**
 * The weld zone kept clear around each hole when none is given, mm: the
 * larger of 50 mm and twice the shell wall. Recalled shop practice, not a
 * code rule: two welds closer than this share heat-affected metal and leave
 * no room for a grinder or an inspection probe between them; twice the wall
 * covers a full-penetration weld's cap and heat-affected zone on heavy wall,
 * 50 mm the room for tools on thin wall. The code's rules for closely spaced
 * branches (overlapping reinforcement zones) are separate; Girth does not
 * size reinforcement.
 * @example defaultWeldZoneMm(9.53) // 50
 */
export function defaultWeldZoneMm(wallMm: number): number {
  return Math.max(50, 2 * wallMm);
}

/** A hole laid out on the whole (unsplit) plate, before it goes to its course. */
interface PlacedHole {
  readonly index: number;
  readonly name: string;
  readonly label: string;
  readonly clockHours: number;
  readonly stationMm: number;
  /** Outline on the whole plate: x girth from the seam on the mid surface, y from the start end. */
  readonly outline: readonly Point2[];
  readonly centre: Point2;
}

const field = (i: number, key: string): string => `branches[${i}].${key}`;

const clockWords = (hours: number): string => {
  const h = hours === 0 ? 12 : hours;
  return `${Number(h.toFixed(2))} o'clock`;
};

/**
 * Lays out a shell rolled from plate with its branch holes. The plate is the
 * shell's development on its mid-thickness surface: width pi x (OD - t), t
 * the shell wall (common practice: a rolled plate keeps its length at
 * mid-thickness), length the shell's. x is the girth from the long seam,
 * clockwise looking along the shell from its start end (drawn as seen from
 * the outside face), y the distance from the start end.
 *
 * Each hole is the branch's header hole (as `layoutBranch` develops it on the
 * OD), measured on the mid surface like `onDevelopmentSurface` (girth x (OD -
 * t) / OD), turned to its clock position and moved to its station: the
 * hole's girth line through the branch axis lands at girth (clock - seam) x
 * 30° on the mid radius, its axial 0 at the station.
 *
 * A shell longer than `maxPlateLengthMm` is split into the fewest equal
 * courses that fit, each its own template with its y from its lower edge; a
 * hole goes to the course holding its centre.
 *
 * Warnings (codes): `HOLE_CROSSES_SEAM` (a hole runs over the long seam: move
 * the seam), `HOLE_CROSSES_COURSE_SEAM` (over a circumferential seam),
 * `HOLE_NEAR_SEAM` (a seam inside a hole's weld zone), `WELD_ZONES_OVERLAP`
 * (two holes closer than twice the weld zone), plus each branch's own.
 *
 * @param spec the shell, its length, seam, plate limit, weld zone and branches (mm, hours, degrees).
 * @param options stations per hole (4..360, default 16), chord tolerance, mm.
 * @throws GirthError `HOLES_OVERLAP` (`branches[j]`) when two holes overlap;
 *   `OUT_OF_RANGE` (`branches[i].stationMm`) for a hole running off the
 *   shell's ends, (`seamClockHours`, `branches[i].clockHours`) for a clock
 *   outside 0..12, (`maxPlateLengthMm`) for more than {@link MAX_SHELL_COURSES}
 *   courses; `NEGATIVE` for a length at or below 0 (`lengthMm`,
 *   `maxPlateLengthMm`) or a weld zone below 0; `EMPTY_INPUT`
 *   (`branches[i].name`); each branch's own errors with the field under
 *   `branches[i]` (e.g. `branches[1].angleDeg`).
 * @example
 * const plate = layoutShellPlate({ header: { odMm: 610, wallMm: 9.53, label: 'NPS 24 STD' }, lengthMm: 2400,
 *   branches: [{ name: 'N1', branch: { odMm: 168.3, wallMm: 7.11 }, stationMm: 600, clockHours: 12 }] });
 * plate.plateWidthMm // π × (610 − 9.53)
 */
export function layoutShellPlate(spec: ShellPlateSpec, options: ShellPlateOptions = {}): ShellPlateLayout {
  if (spec === null || typeof spec !== 'object') throw new GirthError('BAD_JOB', 'spec', 'spec: expected { header, lengthMm, branches }', spec);
  const header = resolvePipeSection(spec.header, 'header');
  const lengthMm = requirePositive(spec.lengthMm, 'lengthMm');
  const seamClockHours = spec.seamClockHours === undefined ? DEFAULT_SEAM_CLOCK_HOURS : requireInRange(spec.seamClockHours, 'seamClockHours', 0, 12);
  const weldZoneMm = spec.weldZoneMm === undefined ? defaultWeldZoneMm(header.wallMm) : requireNonNegative(spec.weldZoneMm, 'weldZoneMm');
  const maxPlateMm = spec.maxPlateLengthMm === undefined ? undefined : requirePositive(spec.maxPlateLengthMm, 'maxPlateLengthMm');
  if (!Array.isArray(spec.branches)) throw new GirthError('BAD_JOB', 'branches', 'branches: expected a list of branches', spec.branches);

  const t = header.wallMm;
  const development: Development = { surface: 'mid', diameterMm: header.odMm - t, odMm: header.odMm, plateThicknessMm: t };
  const midRadiusMm = development.diameterMm / 2;
  const widthMm = Math.PI * development.diameterMm;
  const seamRad = (seamClockHours * Math.PI) / 6;

  const holes = spec.branches.map((b, i): PlacedHole => placeHole(b, i, header, seamRad, midRadiusMm, options));
  const warnings: GirthWarning[] = [];
  for (const h of holes) {
    const ys = h.outline.map((p) => p[1]);
    if (Math.min(...ys) < 0 || Math.max(...ys) > lengthMm) {
      throw new GirthError('OUT_OF_RANGE', field(h.index, 'stationMm'), `${field(h.index, 'stationMm')}: hole ${h.name} runs off the shell's ends (its edge from ${describeLength(Math.min(...ys))} to ${describeLength(Math.max(...ys))}; the shell is ${describeLength(lengthMm)} long)`, h.stationMm);
    }
  }
  warnings.push(...holeClearances(holes, widthMm, weldZoneMm));

  const courses = maxPlateMm === undefined ? 1 : Math.ceil(lengthMm / maxPlateMm - 1e-9);
  if (courses > MAX_SHELL_COURSES) {
    throw new GirthError('OUT_OF_RANGE', 'maxPlateLengthMm', `maxPlateLengthMm: ${describeLength(maxPlateMm ?? 0)} plates make ${courses} courses of a ${describeLength(lengthMm)} shell (limit: ${MAX_SHELL_COURSES})`, maxPlateMm);
  }
  const courseMm = lengthMm / courses;
  const courseOf = (h: PlacedHole): number => Math.min(courses - 1, Math.floor(h.centre[1] / courseMm));
  for (const h of holes) warnings.push(...seamWarnings(h, courseOf(h), courses, courseMm, widthMm, weldZoneMm, seamClockHours));

  const placed: ShellPlateHole[] = holes.map((h) => {
    const c = courseOf(h);
    return { name: h.name, course: c + 1, girthMm: h.centre[0], axialMm: h.centre[1] - c * courseMm, clockHours: h.clockHours, stationMm: h.stationMm };
  });
  const templates = Array.from({ length: courses }, (_, c) =>
    courseTemplate({ c, courses, courseMm, widthMm, header, development, seamClockHours, weldZoneMm, holes: holes.filter((h) => courseOf(h) === c) }),
  );
  const pipes: PipeUsed[] = [{ role: 'header', label: header.label ?? 'shell', odMm: header.odMm, wallMm: header.wallMm, idMm: header.idMm }];
  for (const b of spec.branches) {
    const p = resolvePipeSection(b.branch, 'branch');
    if (!pipes.some((q) => q.role === 'branch' && q.label === p.label && q.odMm === p.odMm && q.wallMm === p.wallMm)) {
      pipes.push({ role: 'branch', label: p.label ?? 'branch', odMm: p.odMm, wallMm: p.wallMm, idMm: p.idMm });
    }
  }
  return {
    kind: 'shell-plate',
    templates,
    pipes,
    warnings,
    plateWidthMm: widthMm,
    courseLengthMm: courseMm,
    courses,
    lengthMm,
    thicknessMm: t,
    seamClockHours,
    weldZoneMm,
    holes: placed,
  };
}

/** One branch's hole developed on the mid surface and moved to its clock position and station. */
function placeHole(
  b: ShellPlateSpec['branches'][number],
  i: number,
  header: ResolvedPipeSection,
  seamRad: number,
  midRadiusMm: number,
  options: ShellPlateOptions,
): PlacedHole {
  if (b === null || typeof b !== 'object') throw new GirthError('BAD_JOB', `branches[${i}]`, `branches[${i}]: expected a branch`, b);
  if (typeof b.name !== 'string' || b.name.trim() === '') throw new GirthError('EMPTY_INPUT', field(i, 'name'), `${field(i, 'name')}: give the branch a name to print beside its hole`, b.name);
  const stationMm = requireFinite(b.stationMm, field(i, 'stationMm'));
  const clockHours = requireInRange(b.clockHours, field(i, 'clockHours'), 0, 12);
  let hole;
  try {
    const geometry = solveBranch({
      header,
      branch: b.branch,
      ...(b.angleDeg === undefined ? {} : { angleDeg: b.angleDeg }),
      ...(b.offsetMm === undefined ? {} : { offsetMm: b.offsetMm }),
      ...(b.fit === undefined ? {} : { fit: b.fit }),
      ...(b.gapMm === undefined ? {} : { gapMm: b.gapMm }),
    });
    const onOd = developHeaderHole({ geometry, stations: options.stations ?? 16, chordToleranceMm: options.chordToleranceMm, title: b.name, notes: [] });
    hole = { template: onDevelopmentSurface(onOd, { surface: 'mid', plateThicknessMm: header.wallMm }), label: geometry.spec.branch.label ?? 'branch' };
  } catch (e) {
    if (isGirthError(e)) throw e.withField(`branches[${i}].${e.field}`);
    throw e;
  }
  const turn = (((clockHours * Math.PI) / 6 - seamRad) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI);
  const dx = midRadiusMm * turn;
  const move = (p: Point2): Point2 => [p[0] + dx, p[1] + stationMm];
  const cut = hole.template.cut[0];
  const outline = cut !== undefined && cut.kind === 'polyline' ? cut.points.map(move) : [];
  // The centre mark's crossing (the branch axis on the shell), from the hole template's own marks.
  const mark = hole.template.marks[2];
  const centre: Point2 = mark !== undefined && mark.kind === 'segment' ? move([(mark.from[0] + mark.to[0]) / 2, mark.from[1]]) : move([0, 0]);
  return { index: i, name: b.name.trim(), label: hole.label, clockHours, stationMm, outline, centre };
}

/** Holes that overlap (an error) or whose weld zones meet (a warning), across the long seam too. */
function holeClearances(holes: readonly PlacedHole[], widthMm: number, weldZoneMm: number): GirthWarning[] {
  const warnings: GirthWarning[] = [];
  for (let j = 1; j < holes.length; j++) {
    for (let i = 0; i < j; i++) {
      const a = holes[i]!;
      const b = holes[j]!;
      const gap = Math.min(...[-widthMm, 0, widthMm].map((s) => contourGapMm(a.outline, s === 0 ? b.outline : b.outline.map((p) => [p[0] + s, p[1]] as const))));
      if (gap <= 0) {
        throw new GirthError('HOLES_OVERLAP', `branches[${j}]`, `branches[${j}]: the hole for ${b.name} overlaps the hole for ${a.name}; move one along the shell or around it`, b.name);
      }
      if (gap < 2 * weldZoneMm) {
        warnings.push({
          code: 'WELD_ZONES_OVERLAP',
          field: `branches[${j}]`,
          message: `The holes for ${a.name} and ${b.name} are ${describeLength(gap)} apart: their weld zones (${describeLength(weldZoneMm)} each) overlap; check the spacing of the two welds and their reinforcement.`,
        });
      }
    }
  }
  return warnings;
}

/** Warnings for a hole over, or with its weld zone over, the long seam or a course seam. */
function seamWarnings(h: PlacedHole, c: number, courses: number, courseMm: number, widthMm: number, weldZoneMm: number, seamClock: number): GirthWarning[] {
  const xs = h.outline.map((p) => p[0]);
  const ys = h.outline.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const f = `branches[${h.index}]`;
  const out: GirthWarning[] = [];
  if (minX < 0 || maxX > widthMm) {
    out.push({ code: 'HOLE_CROSSES_SEAM', field: f, message: `The hole for ${h.name} runs over the long seam at ${clockWords(seamClock)}: move the seam or the branch; the hole is drawn past the plate's edge.` });
  } else if (minX < weldZoneMm || widthMm - maxX < weldZoneMm) {
    out.push({ code: 'HOLE_NEAR_SEAM', field: f, message: `The long seam at ${clockWords(seamClock)} is within the weld zone of the hole for ${h.name} (${describeLength(Math.min(minX, widthMm - maxX))} from its edge).` });
  }
  const lo = c * courseMm;
  const hi = (c + 1) * courseMm;
  if ((c > 0 && minY < lo) || (c < courses - 1 && maxY > hi)) {
    out.push({ code: 'HOLE_CROSSES_COURSE_SEAM', field: f, message: `The hole for ${h.name} runs over the seam between courses ${minY < lo ? `${c} and ${c + 1}` : `${c + 1} and ${c + 2}`}: move the branch along the shell; the hole is drawn past its course's edge.` });
  } else if ((c > 0 && minY - lo < weldZoneMm) || (c < courses - 1 && hi - maxY < weldZoneMm)) {
    out.push({ code: 'HOLE_NEAR_SEAM', field: f, message: `A seam between courses is within the weld zone of the hole for ${h.name}.` });
  }
  return out;
}

/** Everything one course's template needs. */
interface CourseInput {
  readonly c: number;
  readonly courses: number;
  readonly courseMm: number;
  readonly widthMm: number;
  readonly header: ResolvedPipeSection;
  readonly development: Development;
  readonly seamClockHours: number;
  readonly weldZoneMm: number;
  readonly holes: readonly PlacedHole[];
}

/** One course's plate: the rectangle, its holes, quarter lines, centre marks and words. */
function courseTemplate(k: CourseInput): FlatTemplate {
  const { widthMm: w, courseMm: len } = k;
  const y0 = k.c * len;
  const shift = (p: Point2): Point2 => [p[0], p[1] - y0];
  const outer: Point2[] = [[0, 0], [w, 0], [w, len], [0, len]];
  const cut: PathPart[] = [{ kind: 'polyline', points: outer, closed: true }, ...k.holes.map((h): PathPart => ({ kind: 'polyline', points: h.outline.map(shift), closed: true }))];
  const marks: PathPart[] = [];
  const labels: TemplateLabel[] = [];
  const r = k.development.diameterMm / 2;
  // Quarter lines (12, 3, 6, 9 o'clock) run the plate's length; one on a side edge (the seam) is left out, never drawn over the cut.
  for (const q of [12, 3, 6, 9]) {
    const x = r * (((((q - k.seamClockHours) * Math.PI) / 6) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI));
    if (x < 1 || x > w - 1) continue;
    marks.push({ kind: 'segment', from: [x, LABEL_MM], to: [x, len - LABEL_MM] });
    labels.push({ text: `${q} O'CLOCK`, at: [x + LABEL_MM / 2, 2 * LABEL_MM], heightMm: LABEL_MM });
  }
  const stations: StationRow[] = [];
  k.holes.forEach((h, i) => {
    const [cx, cy] = shift(h.centre);
    marks.push({ kind: 'segment', from: [cx - ARM_MM, cy], to: [cx + ARM_MM, cy] }, { kind: 'segment', from: [cx, cy - ARM_MM], to: [cx, cy + ARM_MM] });
    const top = Math.max(...h.outline.map((p) => p[1])) - y0;
    labels.push({ text: `${h.name} ${h.label}`, at: [cx - ARM_MM, top + LABEL_MM], heightMm: LABEL_MM });
    stations.push({ n: i + 1, angleDeg: (h.clockHours % 12) * 30, values: { girth: cx, axial: cy, station: h.stationMm } });
  });
  labels.push({ text: `SEAM ${clockWords(k.seamClockHours).toUpperCase()}`, at: [LABEL_MM, len - 2 * LABEL_MM], heightMm: LABEL_MM });

  const part = k.courses === 1 ? 'Shell plate' : `Shell plate, course ${k.c + 1} of ${k.courses}`;
  const titleLine: FactLine = factLine`${part}: ${k.header.label ?? 'shell'}, ${lengthFact(len)} long x ${lengthFact(w)} girth`;
  const notes: FactLine[] = [
    factLine`Plate ${lengthFact(k.header.wallMm)} thick; flat width = pi x (OD - t) = ${lengthFact(w)}, the mid-thickness circumference.`,
    developmentNote(k.development),
    textLine(`Long seam at ${clockWords(k.seamClockHours)} on the plate's side edges; girth runs clockwise from it looking along the shell from its start end; drawn as seen from the outside face.`),
    ...(k.courses === 1 ? [] : [factLine`Course ${String(k.c + 1)} of ${String(k.courses)}: from ${lengthFact(y0)} to ${lengthFact(y0 + len)} along the shell; circumferential seams at the top and bottom edges.`]),
    ...k.holes.map((h) => factLine`Hole ${h.name} (${h.label}): station ${lengthFact(h.stationMm)}, ${clockWords(h.clockHours)}; centre at girth ${lengthFact(h.centre[0])}, ${lengthFact(h.centre[1] - y0)} up.`),
    factLine`Weld zone kept clear around each hole: ${lengthFact(k.weldZoneMm)}. Holes are scrap: cut them before rolling.`,
  ];
  return {
    id: k.courses === 1 ? 'shell-plate' : `shell-course-${k.c + 1}`,
    kind: 'flat',
    title: describeLine(titleLine),
    notes: notes.map((l) => describeLine(l)),
    facts: { title: titleLine, notes },
    cut,
    stationLines: [],
    marks,
    labels,
    stationColumns: [
      { key: 'girth', heading: 'Girth from seam', quantity: 'length' },
      { key: 'axial', heading: 'Up from edge', quantity: 'length' },
      { key: 'station', heading: 'Along shell', quantity: 'length' },
    ],
    stations,
    development: k.development,
  };
}
