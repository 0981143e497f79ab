/**
 * The hole in a dished head for a nozzle: a head does not roll out flat, so
 * the hole is given as its outline seen along the nozzle axis, each
 * station's drop from a plane square to the axis, and its tape distances over
 * the head from the crown centre.
 */
import { dot, headTapePosition, parallelTapeShortfallMm, sub, type GeneratorHit, type NozzleGeometry } from '@girth/geometry';
import type { TemplateFacts } from '../facts.js';
import type { HoleTemplate, PathPart, Point2, StationLine, StationRow, TemplateLabel } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';

/** Cap height of the labels on a head-hole template, mm. */
const LABEL_HEIGHT_MM = 5;
/** How far outside the hole each station line starts, where its number is written, mm. */
const STATION_NUMBER_CLEARANCE_MM = 12;
/** Half the length of each arm of the centre mark, mm. */
const CENTRE_ARM_MM = 10;

/** Input of {@link developHeadHole}. */
export interface HeadHoleInput {
  readonly geometry: NozzleGeometry;
  readonly stations: number;
  readonly chordToleranceMm?: number;
  /** Words of the template, from the bound this function also returns (see `headHoleText`). */
  readonly text: (aroundBoundMm: number) => { readonly title: string; readonly notes: readonly string[]; readonly facts?: TemplateFacts };
}

/**
 * A `kind: 'hole'` template of a nozzle's hole in a head. On the sheet: the
 * hole seen along the nozzle axis, x toward the heel (outboard), y toward the
 * side station 5 (90°) is on, origin on the nozzle axis, in mm; a station line
 * from the axis to each station. Columns (mm): `drop`, from the plane square
 * to the nozzle axis through the hole's highest point down to the head along
 * the axis; `meridian` and `around`, the tape position over the head's outside
 * from the crown centre (see `headTapePosition`; `around` positive toward
 * station 5's side). Also returns the most a straight-pulled tape reads under
 * `around` at any station.
 *
 * @throws GirthError as `sampleCut`.
 * @example developHeadHole({ geometry: solveNozzle(spec), stations: 16, text }).template.stations[0]?.values.drop
 */
export function developHeadHole(input: HeadHoleInput): { readonly template: HoleTemplate; readonly aroundBoundMm: number } {
  const g = input.geometry;
  const b = g.holeBundle;
  const seenAlongAxis = (hit: GeneratorHit): Point2 => {
    const rel = sub(hit.point, b.axisPoint);
    return [dot(rel, b.heelDirection), dot(rel, b.sideDirection)];
  };
  const cut = sampleCut(b, g.holeHost, {
    stations: input.stations,
    wrapOdMm: g.spec.nozzle.odMm,
    chordToleranceMm: input.chordToleranceMm,
    flatten: seenAlongAxis,
    longPoints: false,
  });
  const outline = cut.samples.slice(0, -1).map(seenAlongAxis);
  let highest = Infinity;
  for (const s of cut.samples) if (s.axialMm < highest) highest = s.axialMm;

  const n = cut.stations.length;
  const stations: StationRow[] = [];
  const stationLines: StationLine[] = [];
  let aroundBoundMm = 0;
  cut.stations.forEach((hit, i) => {
    const angleDeg = (360 * i) / n;
    const tape = headTapePosition(g.holeHost, hit.point);
    // The head measures around toward axis × reference meridian (+y); station 5 is on −y.
    const around = -tape.aroundMm;
    aroundBoundMm = Math.max(aroundBoundMm, parallelTapeShortfallMm(tape.parallelRadiusMm, around));
    stations.push({ n: i + 1, angleDeg, values: { drop: hit.axialMm - highest, meridian: tape.meridianMm, around } });
    // From just outside the hole (where the number goes) through its edge to the axis.
    const [x, y] = seenAlongAxis(hit);
    const out = 1 + STATION_NUMBER_CLEARANCE_MM / Math.max(Math.hypot(x, y), 1e-9);
    stationLines.push({ n: i + 1, angleDeg, from: [x * out, y * out], to: [0, 0] });
  });

  const r = b.radius;
  const arm = CENTRE_ARM_MM;
  const marks: PathPart[] = [
    { kind: 'segment', from: [-r - 2 * arm, 0], to: [r + 2 * arm, 0] }, // the heel-toe line, in the plane of both axes
    { kind: 'segment', from: [0, -arm], to: [0, arm] },
  ];
  const h = LABEL_HEIGHT_MM;
  const labels: TemplateLabel[] = [
    { text: 'HEEL', at: [r + STATION_NUMBER_CLEARANCE_MM + 2 * h, -2 * h], heightMm: h },
    { text: 'TOE', at: [-r - STATION_NUMBER_CLEARANCE_MM - 4 * h, -2 * h], heightMm: h },
  ];
  const words = input.text(aroundBoundMm);
  return {
    aroundBoundMm,
    template: {
      id: 'head-hole',
      kind: 'hole',
      title: words.title,
      notes: words.notes,
      ...(words.facts === undefined ? {} : { facts: words.facts }),
      wrapOdMm: g.spec.head.odMm,
      placement: 'Set out on a plane square to the nozzle axis (the axis at the centre mark, HEEL outboard), then carry each station down to the head by its drop; or mark by tape from the crown centre.',
      cut: [{ kind: 'polyline', points: outline, closed: true }],
      stationLines,
      marks,
      labels,
      stationColumns: [
        { key: 'drop', heading: 'Drop', quantity: 'length' },
        { key: 'meridian', heading: 'Meridian', quantity: 'length' },
        { key: 'around', heading: 'Around', quantity: 'length' },
      ],
      stations,
    },
  };
}
