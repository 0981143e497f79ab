/**
 * The hole in an elbow for a trunnion: an elbow's body does not roll out
 * flat, so the hole is given as its outline seen along the trunnion axis,
 * each station's drop from a plane square to the axis, and its tape
 * distances over the elbow from the inlet end's extrados.
 */
import { dot, parallelTapeShortfallMm, sub, torusTapePosition, type GeneratorHit, type TrunnionGeometry } from '@girth/geometry';
import type { TemplateFacts } from '../facts.js';
import type { HoleTemplate, PathPart, Point2, StationLine, StationRow, TemplateLabel } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';

const LABEL_HEIGHT_MM = 5;
const STATION_NUMBER_CLEARANCE_MM = 12;
const CENTRE_ARM_MM = 10;

/** Input of {@link developElbowHole}. */
export interface ElbowHoleInput {
  readonly geometry: TrunnionGeometry;
  readonly stations: number;
  readonly chordToleranceMm?: number;
  /** Words of the template, from the bound this function also returns (see `elbowHoleText`). */
  readonly text: (alongBoundMm: number) => { readonly title: string; readonly notes: readonly string[]; readonly facts?: TemplateFacts };
}

/**
 * A `kind: 'hole'` template of a trunnion's hole in an elbow. On the sheet:
 * the hole seen along the trunnion axis, x toward the heel (the inlet end's
 * side), y toward station 5's side, origin on the axis, mm. Columns (mm):
 * `drop`, from the plane square to the trunnion axis through the hole's
 * highest point down to the elbow along the axis; `around` and `along`, the
 * tape position over the elbow's outside from the inlet end's extrados
 * (around the end's circle from the extrados, positive toward the bend axis's
 * +z side, then along the bend on that line; see `torusTapePosition`). Also
 * returns the most a straight-pulled tape reads under `along`.
 *
 * @throws GirthError as `sampleCut`.
 * @example developElbowHole({ geometry: solveTrunnion(spec), stations: 16, text }).template.stations[0]?.values.along
 */
export function developElbowHole(input: ElbowHoleInput): { readonly template: HoleTemplate; readonly alongBoundMm: number } {
  const g = input.geometry;
  const b = g.holeBundle;
  const seenAlongAxis = (hit: GeneratorHit): Point2 => {
    const rel = sub(hit.point, b.axisPoint);
    return [dot(rel, b.heelDirection), dot(rel, b.sideDirection)];
  };
  const cut = sampleCut(b, g.holeHost, {
    stations: input.stations,
    wrapOdMm: g.spec.branch.odMm,
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
  let alongBoundMm = 0;
  cut.stations.forEach((hit, i) => {
    const angleDeg = (360 * i) / n;
    const tape = torusTapePosition(g.holeHost, hit.point);
    alongBoundMm = Math.max(alongBoundMm, parallelTapeShortfallMm(tape.parallelRadiusMm, tape.alongMm));
    stations.push({ n: i + 1, angleDeg, values: { drop: hit.axialMm - highest, around: tape.aroundMm, along: tape.alongMm } });
    const [x, y] = seenAlongAxis(hit);
    const out = 1 + STATION_NUMBER_CLEARANCE_MM / Math.max(Math.hypot(x, y), 1e-9);
    stationLines.push({ n: i + 1, angleDeg, from: [x * out, y * out], to: [0, 0] });
  });

  const r = b.radius;
  const arm = CENTRE_ARM_MM;
  const marks: PathPart[] = [
    { kind: 'segment', from: [-r - 2 * arm, 0], to: [r + 2 * arm, 0] },
    { kind: 'segment', from: [0, -arm], to: [0, arm] },
  ];
  const h = LABEL_HEIGHT_MM;
  const labels: TemplateLabel[] = [
    { text: 'HEEL', at: [r + STATION_NUMBER_CLEARANCE_MM + 2 * h, -2 * h], heightMm: h },
    { text: 'TOE', at: [-r - STATION_NUMBER_CLEARANCE_MM - 4 * h, -2 * h], heightMm: h },
  ];
  const words = input.text(alongBoundMm);
  return {
    alongBoundMm,
    template: {
      id: 'elbow-hole',
      kind: 'hole',
      title: words.title,
      notes: words.notes,
      ...(words.facts === undefined ? {} : { facts: words.facts }),
      wrapOdMm: g.spec.elbow.pipe.odMm,
      placement: "Set out on a plane square to the trunnion axis (the axis at the centre mark, HEEL toward the elbow's inlet end), then carry each station down to the elbow by its drop; or mark by tape from the inlet end's extrados.",
      cut: [{ kind: 'polyline', points: outline, closed: true }],
      stationLines,
      marks,
      labels,
      stationColumns: [
        { key: 'drop', heading: 'Drop', quantity: 'length' },
        { key: 'around', heading: 'Around', quantity: 'length' },
        { key: 'along', heading: 'Along', quantity: 'length' },
      ],
      stations,
    },
  };
}
