/**
 * A layout with its weld preparation put on it: the station table columns,
 * the bevel band beside the wrap, the notes saying the convention, the
 * warnings and the `weldPrep` field, so every table, sheet and the JSON
 * contract carry it.
 */
import { GirthError } from '@girth/pipes';
import type { WeldEndBevel } from '@girth/geometry';
import type { BranchLayout } from '../branch/types.js';
import { angleFact, describeFacts, factLine, lengthFact, textLine, type FactLine } from '../facts.js';
import type { MiterLayout } from '../miter/types.js';
import type { PlaneCutLayout } from '../plane-cut/types.js';
import type { StationBand, StationColumn, StationRow, Template } from '../types.js';
import type { BranchWeldPrep, HoleStationPrep, MiterWeldPrep, PlaneCutWeldPrep, StationWeldPrep, WeldPrep } from './types.js';

/** Digits the tables write the weld preparation's angles to (0.1°, as a bevel is set and checked). */
export const WELD_ANGLE_DECIMALS = 1;

/** The station columns weld preparation adds to a cut's wrap (contract keys, never renamed). */
export const WELD_PREP_COLUMNS: readonly StationColumn[] = [
  { key: 'dihedral', heading: 'Dihedral (deg)', quantity: 'angle', decimals: WELD_ANGLE_DECIMALS },
  { key: 'torch', heading: 'Torch angle (deg)', quantity: 'angle', decimals: WELD_ANGLE_DECIMALS },
];

/** The station column weld preparation adds to a branch's header hole (contract key `torchTilt`). */
export const HOLE_TORCH_COLUMN: StationColumn = { key: 'torchTilt', heading: 'Torch tilt (deg)', quantity: 'angle', decimals: WELD_ANGLE_DECIMALS };

/** What the bevel band writes at a station where the members meet tighter than the groove. */
export const CLOSED_GROOVE_MARK = 'X';

/** The bevel band's cell of one station: the torch angle to 0.1°, `0` where no bevel is needed, `X` where the groove is closed. */
function torchCell(s: StationWeldPrep): string {
  if (s.bevel === 'closed' || s.torchDeg === undefined) return CLOSED_GROOVE_MARK;
  return s.bevel === 'open' ? '0' : s.torchDeg.toFixed(WELD_ANGLE_DECIMALS);
}

/** The two rows of the bevel band: torch angle (nearest the wrap), then dihedral angle. */
function bevelBands(stations: readonly StationWeldPrep[]): readonly StationBand[] {
  return [
    { key: 'torch', heading: 'Torch angle (deg)', cells: stations.map((s) => ({ n: s.n, text: torchCell(s) })) },
    { key: 'dihedral', heading: 'Dihedral (deg)', cells: stations.map((s) => ({ n: s.n, text: s.dihedralDeg.toFixed(WELD_ANGLE_DECIMALS) })) },
  ];
}

/** The convention, in a fitter's words (the same on table, sheet and README). */
function conventionLines(other: string): FactLine[] {
  return [
    textLine(
      `Dihedral: the angle between the outsides of the two members, measured square to the weld line (AWS D1.1 definition, recalled). ` +
        `Torch angle: from square to the pipe wall (radial), in the plane square to the cut line, the torch leaning back toward the pipe body; ` +
        `0 = cut square, the joint already opens the groove; ${CLOSED_GROOVE_MARK} = the members meet tighter than the groove, prepare ${other} too.`,
    ),
  ];
}

/**
 * The ASME B16.25 weld end for a wall as a note line (recalled): 37.5° ± 2.5°
 * from square with a 1/16 in ± 1/32 in land, square for thin walls, compound
 * for walls over 22 mm.
 * @param what what the ends are, e.g. `Square ends of the elbow`.
 * @param end from `weldEndBevel` of `@girth/geometry`.
 * @example describeLine(weldEndLine('Square ends', weldEndBevel(9.53))) // 'Square ends: ASME B16.25 weld-end bevel 37.5° ± 2.5° from square, land 1.6 mm ...'
 */
export function weldEndLine(what: string, end: WeldEndBevel): FactLine {
  if (end.kind === 'square') return factLine`${what}: wall ${lengthFact(end.wallMm)}, ASME B16.25 weld end cut square (recalled).`;
  const base = factLine`${what}: ASME B16.25 weld-end bevel ${angleFact(end.bevelDeg)} ± ${angleFact(end.bevelTolDeg)} from square, land ${lengthFact(end.landMm)} ± ${lengthFact(end.landTolMm)}`;
  if (end.kind === 'single') return [...base, ...factLine` (recalled).`];
  return [...base, ...factLine`, turning to ${angleFact(end.upperBevelDeg)} from ${lengthFact(end.breakMm)} above the inside surface (compound bevel for a wall of ${lengthFact(end.wallMm)}; recalled).`];
}

/**
 * A template's notes with more lines after them (worded mm first, as a layout
 * words them; `describeResult` words them for the job), its facts kept in step.
 * @example appendedNotes(template, [textLine('Weld prep: ...')]).notes.at(-1) // 'Weld prep: ...'
 */
export function appendedNotes(t: Template, lines: readonly FactLine[]): Pick<Template, 'notes' | 'facts'> {
  const notes = [...t.notes, ...describeFacts(lines)];
  return t.facts === undefined ? { notes } : { notes, facts: { title: t.facts.title, notes: [...t.facts.notes, ...lines] } };
}

/** The template with extra columns (values by station number) and note lines; its wording rebuilt from its facts. */
function extendTemplate(
  t: Template,
  columns: readonly StationColumn[],
  valuesOf: (n: number) => Readonly<Record<string, number>>,
  notes: readonly FactLine[],
  bands: readonly StationBand[] | undefined,
): Template {
  const stations: StationRow[] = t.stations.map((row) => ({ ...row, values: { ...row.values, ...valuesOf(row.n) } }));
  const text = appendedNotes(t, notes);
  const extra = { ...text, stationColumns: [...t.stationColumns, ...columns], stations };
  if (t.kind === 'wrap') return { ...t, ...extra, ...(bands === undefined ? {} : { bands: [...(t.bands ?? []), ...bands] }) };
  return { ...t, ...extra };
}

/** Station values of the weld prep, by station number. */
function cutValues(stations: readonly StationWeldPrep[]): (n: number) => Readonly<Record<string, number>> {
  const byN = new Map(stations.map((s) => [s.n, s]));
  return (n): Readonly<Record<string, number>> => {
    const s = byN.get(n);
    if (s === undefined) return {};
    return s.torchDeg === undefined ? { dihedral: s.dihedralDeg } : { dihedral: s.dihedralDeg, torch: s.torchDeg };
  };
}

function holeValues(hole: readonly HoleStationPrep[]): (n: number) => Readonly<Record<string, number>> {
  const byN = new Map(hole.map((s) => [s.n, s]));
  return (n): Readonly<Record<string, number>> => {
    const s = byN.get(n);
    return s === undefined ? {} : { torchTilt: s.torchTiltDeg };
  };
}

function requireSameStations(layoutStations: number, prep: WeldPrep): void {
  if (prep.stations.length !== layoutStations) {
    throw new GirthError(
      'BAD_OPTION',
      'stations',
      `stations: the weld preparation has ${prep.stations.length} stations and the layout ${layoutStations}; make both with the same count`,
      prep.stations.length,
    );
  }
}

function grooveLine(what: string, prep: WeldPrep, gapMm?: number): FactLine {
  const g = prep.groove;
  const gap = gapMm === undefined ? [] : factLine`, root gap ${lengthFact(gapMm)}`;
  return factLine`Weld prep: ${what} ${angleFact(g.grooveAngleDeg)}, land (root face) ${lengthFact(g.landMm)}${gap}.`;
}

/**
 * A branch layout with its weld preparation: the `branch-cut` wrap gains the
 * station columns `dihedral` and `torch` (degrees, written to 0.1°; `torch`
 * left out where the groove is closed), the bevel band (torch angle and
 * dihedral angle at each station, written beside the wrap) and the notes
 * saying the groove and the convention; the `header-hole` gains `torchTilt`
 * (the torch held parallel to the branch axis, its tilt from the header's
 * radial) and a note; the prep's warnings are added and the prep is kept as
 * `weldPrep`.
 *
 * @param layout from `layoutBranch`.
 * @param prep from `weldPrepForBranch` of the same joint and station count.
 * @throws GirthError `BAD_OPTION` (field `stations`) when the station counts differ.
 * @example withBranchWeldPrep(layoutBranch(spec), weldPrepForBranch(spec, { grooveAngleDeg: 45, landMm: 1.6 })).templates[0].stations[8]?.values.dihedral // A at the toe
 */
export function withBranchWeldPrep(layout: BranchLayout, prep: BranchWeldPrep): BranchLayout {
  requireSameStations(layout.stations, prep);
  const [cut, hole] = layout.templates;
  const cutNotes = [grooveLine('groove against the header', prep, layout.gapMm), ...conventionLines('the header')];
  const holeNotes = [
    textLine(
      'Weld prep: cut the hole with the torch parallel to the branch axis, so the hole meets the branch bore; Torch tilt is its angle from square to the header surface at each station.',
    ),
  ];
  return {
    ...layout,
    templates: [
      extendTemplate(cut, WELD_PREP_COLUMNS, cutValues(prep.stations), cutNotes, bevelBands(prep.stations)),
      extendTemplate(hole, [HOLE_TORCH_COLUMN], holeValues(prep.hole), holeNotes, undefined),
    ],
    warnings: [...layout.warnings, ...prep.warnings],
    weldPrep: prep,
  };
}

/**
 * A cut-back layout with its weld preparation: the `plane-cut` wrap gains the
 * `dihedral` and `torch` columns, the bevel band and the notes (see
 * {@link withBranchWeldPrep}); the prep's warnings are added and the prep is
 * kept as `weldPrep`.
 * @throws GirthError `BAD_OPTION` (field `stations`) when the station counts differ.
 * @example withPlaneCutWeldPrep(layoutPlaneCut(spec), weldPrepForPlaneCut(spec, { grooveAngleDeg: 45 })).templates[0].stations[0]?.values.dihedral
 */
export function withPlaneCutWeldPrep(layout: PlaneCutLayout, prep: PlaneCutWeldPrep): PlaneCutLayout {
  requireSameStations(layout.stations, prep);
  const notes = [grooveLine('groove against the plane', prep, layout.gapMm), ...conventionLines('the plate or surface')];
  return {
    ...layout,
    templates: [extendTemplate(layout.templates[0], WELD_PREP_COLUMNS, cutValues(prep.stations), notes, bevelBands(prep.stations))],
    warnings: [...layout.warnings, ...prep.warnings],
    weldPrep: prep,
  };
}

/**
 * A miter layout with its weld preparation: every piece's wrap gains the
 * `dihedral` and `torch` columns (each piece end cut alike; the torch angle
 * makes half the included groove against the weld plane), the bevel band,
 * the notes, and the ASME B16.25 weld end of the elbow's two square ends
 * (recalled); the prep's warnings are added and the prep is kept as
 * `weldPrep`.
 * @throws GirthError `BAD_OPTION` (field `stations`) when the station counts differ.
 * @example withMiterWeldPrep(layoutMiter(spec), weldPrepForMiter(spec, { grooveAngleDeg: 75, landMm: 1.6 })).templates[0].stations[0]?.values.torch
 */
export function withMiterWeldPrep(layout: MiterLayout, prep: MiterWeldPrep): MiterLayout {
  requireSameStations(layout.stations, prep);
  const notes = [
    grooveLine('included groove, half on each piece end,', prep, layout.gapMm),
    ...conventionLines('the other piece'),
    weldEndLine('Square ends of the elbow', prep.squareEnds),
  ];
  return {
    ...layout,
    templates: layout.templates.map((t) => extendTemplate(t, WELD_PREP_COLUMNS, cutValues(prep.stations), notes, bevelBands(prep.stations))),
    warnings: [...layout.warnings, ...prep.warnings],
    weldPrep: prep,
  };
}
