/**
 * The hole in the header for a branch, developed on the header OD.
 */
import { developPoint, hitGenerator, type BranchGeometry, type GeneratorHit } from '@girth/geometry';
import type { HoleTemplate, PathPart, Point2, StationLine, StationRow, TemplateLabel } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';
import type { TemplateFacts } from '../facts.js';

/** Cap height of the labels on a hole template, mm. */
export const HOLE_LABEL_HEIGHT_MM = 5;

/** Half the length of each arm of the centre mark, mm. */
export const CENTRE_MARK_ARM_MM = 10;

/** Input of {@link developHeaderHole}. */
export interface HeaderHoleInput {
  readonly geometry: BranchGeometry;
  /** Number of stations (same as the branch cut). */
  readonly stations: number;
  readonly chordToleranceMm?: number;
  readonly title: string;
  readonly notes: readonly string[];
  /** The typed facts `title` and `notes` were worded from, kept on the template. */
  readonly facts?: TemplateFacts;
}

/**
 * A `kind: 'hole'` template of the branch hole on the header OD, as a closed
 * polyline on the header developed by its surface's own `develop` operation
 * (for the header cylinder): x = girth around the header from its top
 * line (the generator at y = 0, z = +R), positive toward +y, = R · atan2(y, z);
 * y = axial position along the header from x = 0, where the branch axis (or
 * its projection, for an offset branch) crosses the header axis. Both in mm.
 *
 * Stations sit at the same angles as the branch cut's, with columns `girth`
 * and `axial`; station lines run along the header from the girth line y = 0
 * to the hole edge. Marks: the top line, the girth line through y = 0, and a
 * centre mark where the branch axis pierces the header OD. Labels: HEEL and
 * TOE at the hole edge, TOP LINE.
 *
 * @throws GirthError as `sampleCut` (bad options; a generator that misses,
 *   which a solved branch never has).
 * @example developHeaderHole({ geometry: solveBranch(spec), stations: 16, title: 'Header hole', notes: [] }).stations[0]?.values.axial
 */
export function developHeaderHole(input: HeaderHoleInput): HoleTemplate {
  const g = input.geometry;
  // The hole host's own development: on a header, girth from the top line and axial from x = 0.
  const flatten = (hit: GeneratorHit): Point2 => developPoint(g.holeHost, hit.point);
  const cut = sampleCut(g.holeBundle, g.holeHost, {
    stations: input.stations,
    wrapOdMm: g.spec.header.odMm,
    chordToleranceMm: input.chordToleranceMm,
    kinkPhisRad: g.holeKinkPhisRad,
    flatten,
    longPoints: false,
  });
  const n = cut.stations.length;
  const outline = cut.samples.slice(0, -1).map(flatten); // the last sample repeats the first

  const stations: StationRow[] = [];
  const stationLines: StationLine[] = [];
  cut.stations.forEach((hit, i) => {
    const [girth, axial] = flatten(hit);
    const angleDeg = (360 * i) / n;
    stations.push({ n: i + 1, angleDeg, values: { girth, axial } });
    stationLines.push({ n: i + 1, angleDeg, from: [girth, 0], to: [girth, axial] });
  });

  const centre = axisPiercingPoint(g);
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  const [minX, maxX] = [Math.min(0, ...xs), Math.max(0, ...xs)];
  const [minY, maxY] = [Math.min(0, ...ys), Math.max(0, ...ys)];
  const margin = Math.max(CENTRE_MARK_ARM_MM, 0.1 * Math.max(maxX - minX, maxY - minY));
  const arm = CENTRE_MARK_ARM_MM;
  const marks: PathPart[] = [
    { kind: 'segment', from: [0, minY - margin], to: [0, maxY + margin] }, // top line
    { kind: 'segment', from: [minX - margin, 0], to: [maxX + margin, 0] }, // girth line where the axes cross
    { kind: 'segment', from: [centre[0] - arm, centre[1]], to: [centre[0] + arm, centre[1]] },
    { kind: 'segment', from: [centre[0], centre[1] - arm], to: [centre[0], centre[1] + arm] },
  ];

  const h = HOLE_LABEL_HEIGHT_MM;
  const outside = (p: Point2): Point2 => {
    const dx = p[0] - centre[0];
    const dy = p[1] - centre[1];
    const d = Math.hypot(dx, dy) || 1;
    return [p[0] + (2 * h * dx) / d, p[1] + (2 * h * dy) / d];
  };
  const toe = hitGenerator(g.holeBundle, g.holeHost, Math.PI);
  const labels: TemplateLabel[] = [
    { text: 'HEEL', at: outside(flatten(cut.stations[0]!)), heightMm: h },
    ...(toe === undefined ? [] : [{ text: 'TOE', at: outside(flatten(toe)), heightMm: h }]),
    // Beside the top line's far end, clear of the TOE under it: side by side they would read as one phrase, stacked as a fraction.
    { text: 'TOP LINE', at: [6 * h, maxY + margin + 2 * h], heightMm: h },
  ];

  return {
    id: 'header-hole',
    kind: 'hole',
    title: input.title,
    notes: input.notes,
    ...(input.facts === undefined ? {} : { facts: input.facts }),
    wrapOdMm: g.spec.header.odMm,
    cut: [{ kind: 'polyline', points: outline, closed: true }],
    stationLines,
    marks,
    labels,
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'axial', heading: 'Axial', quantity: 'length' },
    ],
    stations,
  };
}

/** Where the branch axis meets the header OD (the hole bundle's generator of radius 0), developed. */
function axisPiercingPoint(g: BranchGeometry): Point2 {
  const hit = hitGenerator({ ...g.holeBundle, radius: 0 }, g.holeHost, 0);
  return hit === undefined ? [0, 0] : developPoint(g.holeHost, hit.point);
}
